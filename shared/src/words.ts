const counts = new Intl.NumberFormat('en-GB');

/**
 * A count with its noun, the count grouped as English writes it: plural(1, 'guest') → "1 guest",
 * plural(3, 'batch', 'batches') → "3 batches", plural(1999, 'plate') → "1,999 plates".
 */
export function plural(n: number, one: string, many = `${one}s`): string {
  return `${counts.format(n)} ${n === 1 ? one : many}`;
}
