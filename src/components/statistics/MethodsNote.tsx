import type { Json } from '../../lib/contracts/json';
import type { StatisticsBasis } from '../../lib/contracts/statistics';
import type { MethodNotes } from '../../lib/statistics';

/** How the figures are made, in words: percentiles, log scale, quality, disclosure, masking, regression. */
export default function MethodsNote({ methods, basis }: { methods: Json<MethodNotes>; basis: Json<StatisticsBasis> }) {
  return (
    <details className="panel p-3 text-xs text-ink-700" data-testid="methods">
      <summary className="cursor-pointer font-semibold text-ink-800">How these figures are made</summary>
      <ul className="mt-2 list-disc space-y-1 pl-4">
        <li>{methods.percentiles}</li>
        <li>{methods.logScale}</li>
        <li>{methods.quality}</li>
        <li>{methods.disclosure}</li>
        <li>{methods.masking}</li>
        <li>{methods.regression}</li>
        <li>
          Bank version {basis.bankVersion ?? 'none yet'}; {basis.tests} tests in the selection (
          {basis.selection || 'the whole bank'}).
        </li>
      </ul>
    </details>
  );
}
