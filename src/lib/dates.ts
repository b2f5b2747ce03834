// Every date the client shows, in one place and one locale.
const dayFormat = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', year: 'numeric' });
const longDayFormat = new Intl.DateTimeFormat('en-US', { month: 'long', day: 'numeric', year: 'numeric' });
const timeFormat = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });
const stampFormat = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit', second: '2-digit' });

function valid(iso: string): Date | null {
  const at = new Date(iso);
  return Number.isNaN(at.getTime()) ? null : at;
}

function sameDay(a: Date, b: Date): boolean {
  return a.getFullYear() === b.getFullYear() && a.getMonth() === b.getMonth() && a.getDate() === b.getDate();
}

/** "Dec 1, 2026" */
export function formatDay(iso: string): string {
  const at = valid(iso);
  return at ? dayFormat.format(at) : '';
}

/** "December 1, 2026" */
export function formatLongDay(iso: string): string {
  const at = valid(iso);
  return at ? longDayFormat.format(at) : '';
}

/** "Dec 1, 2026, 10:58 PM" — for a tooltip, a comment or a printed card. */
export function formatDateTime(iso: string): string {
  const at = valid(iso);
  return at ? `${dayFormat.format(at)}, ${timeFormat.format(at)}` : '';
}

/** "Dec 1, 10:58:03 PM": when a message arrived, to the second. */
export function formatStamp(iso: string): string {
  const at = valid(iso);
  return at ? stampFormat.format(at) : '';
}

/** "Today, 10:58 PM", "Yesterday, 9:05 AM", or "Nov 28, 2026" for anything older. */
export function formatWhen(iso: string, now: Date = new Date()): string {
  const at = valid(iso);
  if (!at) return '';
  if (sameDay(at, now)) return `Today, ${timeFormat.format(at)}`;
  const yesterday = new Date(now);
  yesterday.setDate(now.getDate() - 1);
  if (sameDay(at, yesterday)) return `Yesterday, ${timeFormat.format(at)}`;
  return dayFormat.format(at);
}
