interface ProgressBarProps {
  /** 0 to 1 */
  fraction: number;
  label: string;
}

/** How far reading a file has got. */
export default function ProgressBar({ fraction, label }: ProgressBarProps) {
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div data-testid="read-progress">
      <div className="flex justify-between text-xs text-ink-600">
        <span>{label}</span>
        <span>{percent} %</span>
      </div>
      <div
        className="mt-1 h-2 overflow-hidden rounded bg-ink-100"
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
      >
        <div className="h-full bg-clay-500 transition-[width]" style={{ width: `${percent}%` }} />
      </div>
    </div>
  );
}
