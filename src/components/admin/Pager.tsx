interface PagerProps {
  offset: number;
  limit: number;
  total: number;
  onPage(offset: number): void;
}

/** "21–40 of 112" with newer/older buttons. */
export default function Pager({ offset, limit, total, onPage }: PagerProps) {
  if (total === 0) return null;
  const last = Math.min(offset + limit, total);
  return (
    <div
      className="flex flex-wrap items-center justify-between gap-2 border-t border-ink-100 px-4 py-2 text-sm"
      data-testid="pager"
    >
      <span className="text-ink-600">
        {(offset + 1).toLocaleString('en-GB')}–{last.toLocaleString('en-GB')} of {total.toLocaleString('en-GB')}
      </span>
      <span className="flex gap-2">
        <button type="button" className="btn-quiet" disabled={offset === 0} onClick={() => onPage(Math.max(0, offset - limit))}>
          Previous page
        </button>
        <button type="button" className="btn-quiet" disabled={last >= total} onClick={() => onPage(offset + limit)}>
          Next page
        </button>
      </span>
    </div>
  );
}
