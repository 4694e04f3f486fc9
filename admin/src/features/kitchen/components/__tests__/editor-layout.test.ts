import { describe, expect, it } from 'vitest';
import { editorAreas } from '../editor-layout';

// CSS Grid `grid-template-areas` (CSS Grid Layout Module Level 1, §7.3): one quoted string a
// row, one name a cell. On a phone the figures come after the name and the main list of an item,
// before the longer sections (common practice, no source).
describe('editorAreas', () => {
  it('puts the figures beside every section on a wide screen, and third on a phone', () => {
    expect(editorAreas(['basics', 'components', 'plating', 'photos'])).toEqual({
      base: '"basics" "components" "panel" "plating" "photos"',
      lg: '"basics panel" "components panel" "plating panel" "photos panel"',
    });
    expect(editorAreas(['basics', 'lines', 'method', 'equipment', 'notes'])).toEqual({
      base: '"basics" "lines" "panel" "method" "equipment" "notes"',
      lg: '"basics panel" "lines panel" "method panel" "equipment panel" "notes panel"',
    });
  });

  it('places the figures after as many sections as asked, or last when there are fewer', () => {
    expect(editorAreas(['basics', 'desserts'], 1).base).toBe('"basics" "panel" "desserts"');
    expect(editorAreas(['basics'])).toEqual({ base: '"basics" "panel"', lg: '"basics panel"' });
  });
});
