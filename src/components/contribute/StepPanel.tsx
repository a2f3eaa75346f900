import type { ReactNode } from 'react';

interface StepPanelProps {
  step: number;
  title: string;
  lead?: ReactNode;
  testId: string;
  children: ReactNode;
}

/** One numbered step of the upload, as a panel. */
export default function StepPanel({ step, title, lead, testId, children }: StepPanelProps) {
  const headingId = `${testId}-heading`;
  return (
    <section className="panel" aria-labelledby={headingId} data-testid={testId}>
      <div className="flex items-baseline gap-3 border-b border-ink-200 px-4 py-2">
        <span className="flex h-6 w-6 shrink-0 items-center justify-center rounded-full bg-clay-100 text-xs font-semibold text-clay-800">
          {step}
        </span>
        <div>
          <h2 id={headingId}>{title}</h2>
          {lead && <p className="text-xs text-ink-500">{lead}</p>}
        </div>
      </div>
      <div className="space-y-3 p-4">{children}</div>
    </section>
  );
}
