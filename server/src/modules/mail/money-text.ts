/** An amount in minor units as a person reads it in messages and e-mails (USD 1234 → $12.34). */
export function formatMoneyText(cents: number, currency: string): string {
  const formatter = new Intl.NumberFormat('en-US', { style: 'currency', currency });
  const digits = formatter.resolvedOptions().maximumFractionDigits ?? 2;
  return formatter.format(cents / 10 ** digits);
}
