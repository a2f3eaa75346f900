const DATE_TIME = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

/** A stored value for a dense table: four significant figures, exponent for the very small (k in m/s), a dash for none. */
export function formatValue(value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value !== 'number') return String(value);
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const size = Math.abs(value);
  if (size < 0.001) return value.toExponential(2);
  if (size >= 1000) return value.toLocaleString('en-GB', { maximumFractionDigits: 1, useGrouping: false });
  return String(Number(value.toPrecision(4)));
}

/** "3 Dec 2026, 14:05", or a dash. */
export function formatDateTime(value: string | null | undefined): string {
  if (!value) return '—';
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? '—' : DATE_TIME.format(date);
}

/** "1 test record", "3 test records". */
export function plural(count: number, singular: string, pluralForm = `${singular}s`): string {
  return `${count.toLocaleString('en-GB')} ${count === 1 ? singular : pluralForm}`;
}
