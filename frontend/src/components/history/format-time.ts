// One format for every time in a history: date, time and the reader's zone, e.g. "2 Mar 2026, 14:05 CET".
// (dateStyle/timeStyle cannot be combined with timeZoneName, so the parts are named one by one.)
const FORMAT = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit', timeZoneName: 'short' });

export const formatHistoryTime = (iso: string): string => FORMAT.format(new Date(iso));
