/** Plain names and tag colours for submission and test-record states. */
const LABELS: Readonly<Record<string, string>> = {
  draft: 'Draft',
  submitted: 'Waiting for review',
  in_review: 'In review',
  returned: 'Returned',
  accepted: 'Accepted',
  rejected: 'Rejected',
  withdrawn: 'Withdrawn',
  pending: 'Waiting',
  published: 'Published',
};

const TONES: Readonly<Record<string, string>> = {
  draft: 'bg-ink-100 text-ink-600',
  submitted: 'bg-tide-100 text-tide-800',
  in_review: 'bg-tide-100 text-tide-800',
  pending: 'bg-tide-100 text-tide-800',
  returned: 'bg-caution-100 text-caution-700',
  accepted: 'bg-sound-100 text-sound-700',
  published: 'bg-sound-100 text-sound-700',
  rejected: 'bg-fault-100 text-fault-700',
  withdrawn: 'bg-ink-100 text-ink-600',
};

export function statusLabel(status: string): string {
  return LABELS[status] ?? status;
}

/** Tailwind classes for a `.tag` showing the status. */
export function statusTone(status: string): string {
  return TONES[status] ?? 'bg-ink-100 text-ink-600';
}

const SOURCE_KINDS: Readonly<Record<string, string>> = { csv: 'CSV', ags4: 'AGS4', api: 'API', seed: 'Demo data' };

export function sourceKindLabel(kind: string): string {
  return SOURCE_KINDS[kind] ?? kind;
}
