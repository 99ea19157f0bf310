/** Money figures as the app formats them (lib/format.ts formatMoney: "EUR 1,234.50"), found in a page's text. */
export function moneyIn(text: string): string[] {
  return text.match(/\b(?:EUR|GBP|USD|CHF)\s?\d[\d,]*(?:\.\d+)?/g) ?? [];
}
