/** Dollars and cents typed by a person ("12", "12.5", "$12.50", "12,50"), as integer cents; undefined when it is not an amount. */
export function parseCents(text: string): number | undefined {
  const match = /^\s*\$?\s*(\d{1,7})(?:[.,](\d{1,2}))?\s*$/.exec(text);
  if (!match) return undefined;
  return Number(match[1]) * 100 + Number((match[2] ?? '0').padEnd(2, '0'));
}
