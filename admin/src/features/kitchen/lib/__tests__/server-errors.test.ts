import { RecipeCycleError, UnknownReferenceError } from '@nappe/shared';
import { describe, expect, it } from 'vitest';
import { ApiError, NETWORK_ERROR_MESSAGE } from '../../../../lib/api-client';
import { recipeFieldOf } from '../recipe-form-values';
import { saveErrorsOf } from '../server-errors';

// A refused save arrives in Nest's shape `{ statusCode: 400, message: string[] }`, one line per
// problem written `path: message` (api/src/common/zod-validation.pipe.ts, formatIssues); the
// messages themselves are the shared schema's and the shared kitchen errors'.
const badRequest = (...messages: string[]) => new ApiError(400, messages);

describe('saveErrorsOf', () => {
  it('puts each message with a schema path beside its form field', () => {
    const paths: PropertyKey[][] = [];
    const result = saveErrorsOf(
      badRequest('lines[2].quantity: The quantity must be more than 0.', 'name: Give it a name.'),
      (path) => {
        paths.push([...path]);
        return recipeFieldOf(path);
      },
    );
    expect(paths).toEqual([['lines', 2, 'quantity'], ['name']]);
    expect(result).toEqual({
      fields: [
        { field: 'lines.2.quantity', message: 'The quantity must be more than 0.' },
        { field: 'name', message: 'Give it a name.' },
      ],
      summary: 'Please check the fields marked below.',
    });
  });

  it('says a message about the whole form in the alert, path and all', () => {
    // recipeFieldOf sends `lines` without an index to `root.lines`: no single field shows it.
    const result = saveErrorsOf(
      badRequest('lines: Add at least one line.', 'yieldG: The yield must be more than 0.'),
      recipeFieldOf,
    );
    expect(result).toEqual({
      fields: [{ field: 'yieldG', message: 'The yield must be more than 0.' }],
      summary: 'lines: Add at least one line.',
    });
  });

  it('lets the editor place a message that names no path, and says the rest in the alert', () => {
    const loop = new RecipeCycleError(
      ['Crumble tartlet', 'Sablé dough', 'Crumble tartlet'],
      ['rec-tartlet', 'rec-sable', 'rec-tartlet'],
    ).message;
    const gone = new UnknownReferenceError('ingredient', 'ing-gone', 'Sablé dough').message;
    const asked: string[] = [];
    const result = saveErrorsOf(badRequest(loop, gone), recipeFieldOf, (message) => {
      asked.push(message);
      return message === loop ? 'lines.4.ref' : null;
    });
    expect(asked).toEqual([loop, gone]);
    expect(result).toEqual({
      fields: [{ field: 'lines.4.ref', message: loop }],
      summary: gone,
    });
  });

  it('asks nothing of the editor for a message already at its field', () => {
    const result = saveErrorsOf(badRequest('name: Give it a name.'), recipeFieldOf, () => {
      throw new Error('not asked');
    });
    expect(result.fields).toEqual([{ field: 'name', message: 'Give it a name.' }]);
  });

  it('says other refusals and failures in words alone', () => {
    const fieldOf = () => {
      throw new Error('no field for a failure that is not about the input');
    };
    // A 409 on a save (danglingReference in api/src/kitchen/catalogue/kitchen-catalogue.service.ts).
    const dangling =
      '“Sablé dough” refers to something that no longer exists; reload and try again.';
    expect(saveErrorsOf(new ApiError(409, [dangling]), fieldOf)).toEqual({
      fields: [],
      summary: dangling,
    });
    expect(saveErrorsOf(new ApiError(503, ['Service Unavailable']), fieldOf)).toEqual({
      fields: [],
      summary: 'The server ran into a problem. Please try again in a moment.',
    });
    // Status 0: no answer at all (web-kit/src/api-client.ts).
    expect(saveErrorsOf(new ApiError(0, [NETWORK_ERROR_MESSAGE]), fieldOf)).toEqual({
      fields: [],
      summary: NETWORK_ERROR_MESSAGE,
    });
    expect(saveErrorsOf(new TypeError('Failed to fetch'), fieldOf)).toEqual({
      fields: [],
      summary: 'Please try again in a moment.',
    });
  });
});
