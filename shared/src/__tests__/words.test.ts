import { describe, expect, it } from 'vitest';
import { plural } from '../words.js';

describe('plural', () => {
  it('uses the singular for exactly one, the plural otherwise (zero included, as English does)', () => {
    expect(plural(1, 'guest')).toBe('1 guest');
    expect(plural(0, 'guest')).toBe('0 guests');
    expect(plural(2, 'batch', 'batches')).toBe('2 batches');
    expect(plural(-1, 'day')).toBe('-1 days');
    expect(plural(1999, 'guest requirement')).toBe('1,999 guest requirements');
  });
});
