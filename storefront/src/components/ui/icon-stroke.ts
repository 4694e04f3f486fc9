/** How our line icons are drawn: a 1.75 stroke on a 24-unit grid, rounded ends and joins. */
export const stroke = {
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 1.75,
  strokeLinecap: 'round',
  strokeLinejoin: 'round',
} as const;
