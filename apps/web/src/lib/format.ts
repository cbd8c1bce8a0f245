const dateTime = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });
const dateOnly = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric' });
const time = new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit' });

function parse(iso: string): Date | null {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? null : date;
}

export function formatDateTime(iso: string | null | undefined): string {
  const date = iso ? parse(iso) : null;
  return date ? dateTime.format(date) : '—';
}

export function formatDate(iso: string | null | undefined): string {
  const date = iso ? parse(iso) : null;
  return date ? dateOnly.format(date) : '—';
}

/** Today's entries show the time only; older ones the date. */
export function formatCompact(iso: string, now = new Date()): string {
  const date = parse(iso);
  if (!date) return '—';
  return date.toDateString() === now.toDateString() ? time.format(date) : dateOnly.format(date);
}
