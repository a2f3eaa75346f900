import type { CheckResult } from '../../lib/contracts/submissions';
import { FIELD_BY_KEY } from '../../lib/import';
import { PRIVATE_FIELDS } from './record-fields';
import StepPanel from './StepPanel';

interface SharedPreviewProps {
  check: CheckResult | null;
}

/** Step 4: the shared, anonymised view of the first rows exactly as other firms will see it, and what stays private. */
export default function SharedPreview({ check }: SharedPreviewProps) {
  const preview = check?.preview ?? [];
  return (
    <StepPanel
      step={4}
      title="What others will see"
      lead="Once published, other firms and the stewards see only this shared record of each test."
      testId="shared-preview"
    >
      {!check && <p className="text-sm text-ink-500">Shown after the check: the shared record of the first ready rows.</p>}
      {check && preview.length === 0 && (
        <p className="text-sm text-ink-600">No row is ready yet; correct the rows above and check again.</p>
      )}
      {preview.length > 0 && (
        <>
          <p className="text-xs text-ink-500">
            The first {preview.length} ready {preview.length === 1 ? 'row' : 'rows'}, values in the bank's units.
          </p>
          <ol className="divide-y divide-ink-100 rounded border border-ink-200" data-testid="shared-preview-table">
            {preview.map((row) => (
              <li key={row.row} className="flex gap-3 px-3 py-2" data-testid="shared-preview-row">
                <span className="w-12 shrink-0 text-xs font-semibold text-ink-600">Row {row.row}</span>
                <dl className="flex flex-wrap gap-x-4 gap-y-0.5 text-sm">
                  {row.shared.map((entry) => (
                    <div key={entry.field} className="flex gap-1">
                      <dt className="text-ink-500">{entry.label}</dt>
                      <dd className="font-medium text-ink-900">{entry.value}</dd>
                    </div>
                  ))}
                </dl>
              </li>
            ))}
          </ol>
        </>
      )}
      <div className="grid gap-3 text-sm md:grid-cols-2">
        <div data-testid="private-list">
          <h3 className="text-sm">Stays private to your firm</h3>
          <p className="text-xs text-ink-600">{PRIVATE_FIELDS.map((f) => f.label).join(', ')}.</p>
          <p className="mt-1 text-xs text-ink-500">
            Exact coordinates become a 5 km location cell in the shared record. Stewards never see the private details.
          </p>
        </div>
        {check && check.flags.length > 0 && (
          <div data-testid="anonymity-flags">
            <h3 className="text-sm text-caution-700">Shared text the stewards will look at</h3>
            <p className="text-xs text-ink-500">
              Text that may identify a site, or that a spreadsheet may run as a formula. Change the text if it names a project or
              client.
            </p>
            <ul className="mt-1 list-disc pl-5 text-xs">
              {check.flags.map((flag) => (
                <li key={`${flag.row}-${flag.field}`}>
                  Row {flag.row}, {FIELD_BY_KEY.get(flag.field)?.label ?? flag.field}: {flag.reason}
                </li>
              ))}
            </ul>
          </div>
        )}
      </div>
    </StepPanel>
  );
}
