const dateFormat = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', year: 'numeric' });
const timeFormat = new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit' });

function valid(iso: string): Date | null {
  const at = new Date(iso);
  return Number.isNaN(at.getTime()) ? null : at;
}

/** "Dec 1, 2026" */
export function formatDay(iso: string): string {
  const at = valid(iso);
  return at ? dateFormat.format(at) : '';
}

/** "Dec 1, 2026, 10:58 PM" */
export function formatDayTime(iso: string): string {
  const at = valid(iso);
  return at ? `${dateFormat.format(at)}, ${timeFormat.format(at)}` : '';
}
