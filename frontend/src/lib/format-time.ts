// One way to show a moment everywhere in the app: date, time and the reader's zone, e.g.
// "2 Mar 2026, 14:05 CET"; and a date alone, e.g. "2 Mar 2026". Recorded times are instants
// (the server keeps them in UTC); each reader sees them in their own zone, which is named.
// (dateStyle/timeStyle cannot be combined with timeZoneName, so the parts are named one by one.)
const DATE_TIME = new Intl.DateTimeFormat(undefined, {
  year: 'numeric',
  month: 'short',
  day: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
  timeZoneName: 'short',
});
const DATE = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric' });

export const formatDateTime = (iso: string): string => DATE_TIME.format(new Date(iso));
export const formatDate = (iso: string): string => DATE.format(new Date(iso));
