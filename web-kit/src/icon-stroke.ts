/**
 * How Nappe's line icons are drawn, in both apps and in web-kit: a 1.75 stroke on a 24-unit grid,
 * rounded ends and joins. Spread it on each `<path>`/`<circle>` of an icon.
 */
export const iconStroke = {
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 1.75,
  strokeLinecap: 'round',
  strokeLinejoin: 'round',
} as const;
