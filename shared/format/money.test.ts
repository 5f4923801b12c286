import { describe, expect, it } from 'vitest';
import { CLASS_CURRENCIES, formatMoney, MINOR_PER_MAJOR, minorToFormText } from './money.ts';

describe('class currencies', () => {
  it('all have two decimals (ISO 4217 minor unit 2), as Intl’s currency data (ICU/CLDR) reports', () => {
    for (const c of CLASS_CURRENCIES) {
      const digits = new Intl.NumberFormat('en', { style: 'currency', currency: c }).resolvedOptions().maximumFractionDigits;
      expect(10 ** digits!, c).toBe(MINOR_PER_MAJOR);
    }
  });
});

describe('formatMoney', () => {
  it('writes minor units in the viewer’s locale (CLDR patterns, via Intl)', () => {
    expect(formatMoney(2500, 'USD', 'en-US')).toBe('$25.00');
    expect(formatMoney(123456, 'EUR', 'de-DE')).toBe('1.234,56\u00a0€');
    expect(formatMoney(99, 'GBP', 'en-GB')).toBe('£0.99');
  });
  it('falls back to the runtime’s locale for a tag Intl refuses, and refuses fractions of a minor unit', () => {
    expect(formatMoney(100, 'USD', 'not a tag!')).toContain('1.00');
    expect(() => formatMoney(1.5, 'USD', 'en-US')).toThrow();
  });
  it('minorToFormText gives the form’s text', () => {
    expect(minorToFormText(2500)).toBe('25.00');
    expect(minorToFormText(5)).toBe('0.05');
  });
});
