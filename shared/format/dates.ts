// One way to write dates on every page, e-mail and island: Intl.DateTimeFormat with the viewer's locale, a medium
// date ("5 Dec 2026" / "Dec 5, 2026") and, where the hour matters (a lesson's release), a short time. Pages
// rendered on the server do not know the viewer's time zone, so they write UTC and say so; the page script
// src/components/ui/localTimes.ts rewrites every <time data-local-time> into the browser's own zone.

export type DateKind = 'day' | 'day-time';

export interface DateStyle {
  /** A BCP 47 tag (the browser's language, or the first usable one in Accept-Language); undefined: the runtime's. */
  readonly locale?: string | undefined;
  /** An IANA zone; undefined: the runtime's own (the browser's zone in an island). */
  readonly timeZone?: string | undefined;
}

const OPTIONS: Record<DateKind, Intl.DateTimeFormatOptions> = {
  day: { dateStyle: 'medium' },
  'day-time': { dateStyle: 'medium', timeStyle: 'short' },
};

/** `at` (ISO text, a Date or ms since epoch) written as a date, or a date and time, in the given locale and zone. */
export function formatDate(at: string | number | Date, kind: DateKind, style: DateStyle = {}): string {
  const date = at instanceof Date ? at : new Date(at);
  if (Number.isNaN(date.getTime())) return '';
  const text = new Intl.DateTimeFormat(usableLocale(style.locale), { ...OPTIONS[kind], timeZone: style.timeZone }).format(date);
  // A time in UTC is labelled, so nobody reads it as their own clock (a date alone needs no label).
  return kind === 'day-time' && style.timeZone === 'UTC' ? `${text} UTC` : text;
}

/** The first language in an Accept-Language header that Intl can format dates in; undefined when none is. */
export function localeFromAcceptLanguage(header: string | null | undefined): string | undefined {
  if (!header) return undefined;
  const tags = header
    .split(',')
    .map((part) => {
      const [tag = '', ...params] = part.trim().split(';');
      const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
      return { tag: tag.trim(), q: q ? Number(q.slice(2)) : 1 };
    })
    .filter((t) => t.tag !== '' && t.tag !== '*' && Number.isFinite(t.q) && t.q > 0)
    .sort((a, b) => b.q - a.q);
  for (const t of tags) {
    const locale = usableLocale(t.tag);
    if (locale) return locale;
  }
  return undefined;
}

function usableLocale(tag: string | undefined): string | undefined {
  if (!tag) return undefined;
  try {
    return Intl.DateTimeFormat.supportedLocalesOf([tag])[0];
  } catch {
    return undefined; // not a well-formed language tag
  }
}

/** For text written with no viewer at hand (e-mails, API messages): a month-name date reads the same everywhere. */
export const WITHOUT_VIEWER: DateStyle = { locale: 'en-GB', timeZone: 'UTC' };
