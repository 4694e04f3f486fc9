import { describe, expect, it } from 'vitest';
import { DEMO_RECIPES } from '../demo-catalogue.js';
import {
  LOCAL_CODE_DEFERRAL,
  cautionForStep,
  safetyNotesForStep,
  storageCaution,
  withSafetyCautions,
} from '../safety.js';
import { recipe } from './fixtures.js';

describe('safety cautions from what a step does and how hot or cold it gets', () => {
  it('hot sugar at 118 °C names the stage (Braker: firm ball) and the burn risk', () => {
    const [note] = safetyNotesForStep({ kind: 'sugar_syrup', temperatureC: 118 });
    expect(note?.topic).toBe('hot_sugar');
    expect(note?.text).toMatch(/118 °C \(firm ball\) burns/);
  });

  it('custard: cook to 82–85 °C; cooling 57 → 21 °C within 2 h, ≤ 5 °C within 6 h (FDA Food Code §3-501.14(A))', () => {
    const [note] = safetyNotesForStep({ kind: 'custard', temperatureC: 85 });
    expect(note?.text).toMatch(/82–85 °C/);
    expect(note?.text).toMatch(
      /57 °C to 21 °C within 2 hours, then to 5 °C or below within 6 hours/,
    );
    expect(note?.text).toMatch(/63 °C for 15 s/); // FDA Food Code §3-401.11(A)(1)
    expect(note?.source).toContain('§3-501.14(A)');
  });

  it('flags a custard below the finish or hot enough to curdle', () => {
    expect(safetyNotesForStep({ kind: 'custard', temperatureC: 78 })[0]?.text).toMatch(
      /78 °C is below that finish/,
    );
    expect(safetyNotesForStep({ kind: 'custard', temperatureC: 90 })[0]?.text).toMatch(
      /expect curdling/,
    );
  });

  it('frozen storage at −18 °C or below (USDA FSIS), and says when a step is too warm', () => {
    const [ok] = safetyNotesForStep({ kind: 'freeze', temperatureC: -20 });
    expect(ok?.text).toMatch(/−18 °C \(0 °F\) or below\.$/);
    expect(ok?.source).toMatch(/USDA FSIS/);
    expect(safetyNotesForStep({ kind: 'freeze', temperatureC: -10 })[0]?.text).toMatch(/too warm/);
  });

  it('cold holding at 5 °C or below (FDA Food Code)', () => {
    expect(safetyNotesForStep({ kind: 'chill', temperatureC: 4 })[0]?.topic).toBe('cold_holding');
    expect(safetyNotesForStep({ kind: 'chill', temperatureC: 8 })[0]?.text).toMatch(/too warm/);
  });

  it('an oven step gives both scales: 160 °C (320 °F)', () => {
    expect(safetyNotesForStep({ kind: 'bake', temperatureC: 160 })[0]?.text).toMatch(
      /160 °C \(320 °F\)/,
    );
  });

  it('needs no caution for tempering chocolate at 45 °C or whipping cream', () => {
    expect(cautionForStep({ kind: 'temper', temperatureC: 45 })).toBeUndefined();
    expect(cautionForStep({ kind: 'whip' })).toBeUndefined();
  });

  it('always defers to the local food code', () => {
    expect(cautionForStep({ kind: 'sugar_syrup', temperatureC: 118 })).toMatch(
      new RegExp(`${LOCAL_CODE_DEFERRAL}$`),
    );
    expect(storageCaution('frozen')).toContain(LOCAL_CODE_DEFERRAL);
    expect(storageCaution('dry')).toBeUndefined();
  });

  it('fills a missing caution but keeps the chef’s own', () => {
    const r = recipe('r', [], {
      steps: [
        { name: 'Syrup', kind: 'sugar_syrup', activeMinutes: 5, waitMinutes: 0, temperatureC: 121 },
        {
          name: 'Caramel',
          kind: 'caramel',
          activeMinutes: 5,
          waitMinutes: 0,
          caution: 'Our own words.',
        },
      ],
    });
    const filled = withSafetyCautions(r);
    expect(filled.steps[0]?.caution).toMatch(/hard ball/);
    expect(filled.steps[1]?.caution).toBe('Our own words.');
  });

  it('every hot-sugar, custard, cooling, chilling and freezing step in the demo recipes carries a caution', () => {
    const risky = DEMO_RECIPES.flatMap((r) => r.steps).filter((s) =>
      ['sugar_syrup', 'caramel', 'custard', 'cool', 'chill', 'freeze'].includes(s.kind),
    );
    expect(risky.length).toBeGreaterThanOrEqual(8);
    for (const s of risky) expect(s.caution, s.name).toContain(LOCAL_CODE_DEFERRAL);
  });
});
