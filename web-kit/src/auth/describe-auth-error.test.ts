import { describe, expect, it } from 'vitest';
import { ApiError, NETWORK_ERROR_MESSAGE } from '../api-client.js';
import { describeAuthError } from './describe-auth-error.js';

// Status codes as RFC 9110 §15 defines them (400 Bad Request, 401 Unauthorized, 409 Conflict,
// 5xx server errors) and RFC 6585 §4 (429 Too Many Requests); 0 is the API client's "no answer".
describe('describeAuthError', () => {
  it('no answer at all: the connection', () => {
    expect(describeAuthError(new ApiError(0, [NETWORK_ERROR_MESSAGE]), 0)).toEqual({
      title: 'No connection',
      messages: [NETWORK_ERROR_MESSAGE],
    });
  });

  // The messages are the API's own (api/src/auth/auth.service.ts, api/src/studio/team.service.ts).
  it('400 and 401 pass on the server’s own words', () => {
    const invalid = new ApiError(400, ['Enter an e-mail address like name@example.com.']);
    expect(describeAuthError(invalid, 0)).toEqual({
      title: 'Please check the form',
      messages: ['Enter an e-mail address like name@example.com.'],
    });
    const refused = new ApiError(401, ['Wrong e-mail or password.']);
    expect(describeAuthError(refused, 0).title).toBe('We could not sign you in');
    expect(describeAuthError(refused, 0).messages).toEqual(['Wrong e-mail or password.']);
  });

  it('429 names the action and the wait, then says when it is over', () => {
    const throttled = new ApiError(429, ['ThrottlerException: Too Many Requests'], 90);
    expect(describeAuthError(throttled, 90, 'sending reset links')).toEqual({
      title: 'Too many attempts',
      messages: [
        'To protect accounts, sending reset links is paused for a moment. Please try again in 1 minute 30 seconds.',
      ],
    });
    expect(describeAuthError(throttled, 1, 'choosing a new password').messages[0]).toMatch(
      /choosing a new password is paused.*try again in 1 second\.$/,
    );
    expect(describeAuthError(throttled, 0).messages).toEqual(['You can try again now.']);
    // The throttler's own text never reaches the person.
    expect(describeAuthError(throttled, 5).messages.join(' ')).not.toMatch(/Throttler/);
  });

  it('a server error says it is ours, not the person’s', () => {
    for (const status of [500, 502, 503]) {
      expect(describeAuthError(new ApiError(status, ['Internal server error']), 0)).toEqual({
        title: 'Something went wrong',
        messages: ['Something went wrong on our side. Please try again in a moment.'],
      });
    }
  });

  it('another 4xx keeps the server’s words; anything else is a plain apology', () => {
    const used =
      'This invitation has already been used. Sign in with the password you chose, or ask the chef for a new one.';
    expect(describeAuthError(new ApiError(409, [used]), 0).messages).toEqual([used]);
    expect(describeAuthError(new TypeError('x is undefined'), 0)).toEqual({
      title: 'Something went wrong',
      messages: ['Please try again in a moment.'],
    });
  });
});
