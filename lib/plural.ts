/** "1 row", "3 rows": a count with its noun, singular for exactly one. */
export const countOf = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;

/** "3", "3 and 16", "3, 5 and 16": a short list as a person writes it. */
export function listed(items: readonly (string | number)[]): string {
  const texts = items.map(String);
  if (texts.length <= 1) return texts.join('');
  return `${texts.slice(0, -1).join(', ')} and ${texts.at(-1)}`;
}
