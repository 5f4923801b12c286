// Prices are kept in a currency's minor unit (cents, pence) as integers, as the payments service takes them. The
// classes offer a short list of currencies, all with two decimals (ISO 4217 minor unit 2; money.test.ts checks it
// against Intl's currency data), so a form's "25.00" is always 2500. A currency with another exponent (JPY: 0)
// would need the form to scale by it before it could join the list.
export const CLASS_CURRENCIES = ['USD', 'EUR', 'GBP', 'CAD', 'AUD', 'NZD'] as const;
export type ClassCurrency = (typeof CLASS_CURRENCIES)[number];

/** Minor units per major unit for every currency in CLASS_CURRENCIES. */
export const MINOR_PER_MAJOR = 100;

export const isClassCurrency = (code: string): code is ClassCurrency => (CLASS_CURRENCIES as readonly string[]).includes(code);

/**
 * `minor` (an integer count of the currency's minor unit) written for a person in `locale` (a BCP 47 tag;
 * undefined: the runtime's own), e.g. 2500 USD → "$25.00" in en-US, "25,00 $" in fr-FR.
 */
export function formatMoney(minor: number, currency: string, locale?: string): string {
  if (!Number.isInteger(minor)) throw new Error(`format/money: amount ${minor} is not a whole number of minor units`);
  let format: Intl.NumberFormat;
  try {
    format = new Intl.NumberFormat(locale, { style: 'currency', currency });
  } catch {
    format = new Intl.NumberFormat(undefined, { style: 'currency', currency });
  }
  return format.format(minor / MINOR_PER_MAJOR);
}

/** The amount as a form shows it ("25.00"), in major units with two decimals, no symbol. */
export const minorToFormText = (minor: number): string => (minor / MINOR_PER_MAJOR).toFixed(2);
