// Rewrites every <time data-local-time> that the server wrote in UTC into the browser's language and time zone,
// so a lesson that opens at 18:30 UTC reads as the student's own evening (see shared/format/dates.ts).
import { formatDate, type DateKind } from '@shared/format/dates.ts';

function localize(root: ParentNode): void {
  for (const el of Array.from(root.querySelectorAll<HTMLTimeElement>('time[data-local-time]'))) {
    const kind = el.dataset['localTime'] === 'day-time' ? 'day-time' : ('day' satisfies DateKind);
    const text = formatDate(el.dateTime, kind, { locale: navigator.language });
    if (text) el.textContent = text;
  }
}

localize(document);
