/** How long a submission has waited, for people: "3 h", "2 days". */
export function waitingText(days: number): string {
  if (!Number.isFinite(days) || days < 0) return '—';
  if (days < 1 / 24) return 'under an hour';
  if (days < 1) return `${Math.floor(days * 24)} h`;
  const whole = Math.floor(days);
  return `${whole} day${whole === 1 ? '' : 's'}`;
}

/** A week or more is long enough to show in the caution colour. */
export const LONG_WAIT_DAYS = 7;
