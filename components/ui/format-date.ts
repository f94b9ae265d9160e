const whenFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** A server timestamp (ISO 8601) as a short local date and time; the raw text if it cannot be read. */
export function formatWhen(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : whenFormat.format(date);
}
