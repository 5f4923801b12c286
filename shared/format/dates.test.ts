// Outside reference: the Unicode CLDR date patterns that Node's ICU ships (medium date in en-GB is "d MMM y",
// in en-US "MMM d, y", in de "dd.MM.y"), and RFC 9110 §12.5.4 for Accept-Language weights.
import { describe, expect, it } from 'vitest';
import { formatDate, localeFromAcceptLanguage } from './dates.ts';

const at = '2026-12-05T18:30:00Z';

describe('formatDate', () => {
  it('writes a medium date in the viewer locale (CLDR patterns)', () => {
    expect(formatDate(at, 'day', { locale: 'en-GB', timeZone: 'UTC' })).toBe('5 Dec 2026');
    expect(formatDate(at, 'day', { locale: 'en-US', timeZone: 'UTC' })).toBe('Dec 5, 2026');
    expect(formatDate(at, 'day', { locale: 'de-DE', timeZone: 'UTC' })).toBe('05.12.2026');
  });

  it('labels a UTC time and moves a time into another zone', () => {
    expect(formatDate(at, 'day-time', { locale: 'en-GB', timeZone: 'UTC' })).toBe('5 Dec 2026, 18:30 UTC');
    // Auckland is UTC+13 in December (daylight time): the same instant is the next morning there.
    expect(formatDate(at, 'day-time', { locale: 'en-GB', timeZone: 'Pacific/Auckland' })).toBe('6 Dec 2026, 07:30');
  });

  it('writes nothing for an impossible date rather than "Invalid Date"', () => {
    expect(formatDate('not a date', 'day')).toBe('');
  });
});

describe('localeFromAcceptLanguage', () => {
  it('takes the highest weighted language Intl knows (RFC 9110 q-values)', () => {
    expect(localeFromAcceptLanguage('fr;q=0.5, en-GB;q=0.9, *;q=0.1')).toBe('en-GB');
    expect(localeFromAcceptLanguage('de-DE,de;q=0.9,en;q=0.8')).toBe('de-DE');
  });

  it('skips tags that are not language tags and gives up on empty headers', () => {
    expect(localeFromAcceptLanguage('!!!, en-US')).toBe('en-US');
    expect(localeFromAcceptLanguage('')).toBeUndefined();
    expect(localeFromAcceptLanguage(null)).toBeUndefined();
    expect(localeFromAcceptLanguage('en;q=0')).toBeUndefined();
  });
});
