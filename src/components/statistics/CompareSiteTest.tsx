import { useState } from 'react';
import type { Json } from '../../lib/contracts/json';
import type { CompareAnswer } from '../../lib/contracts/statistics';
import { compareBodySchema } from '../../lib/schemas/statistics-request';
import type { SiteComparison } from '../../lib/statistics';
import { PARAMETERS, type ParameterKey } from '../../lib/statistics/parameters';

import { type DisplaySystem, formatQuantity, headerWithUnit, toSi } from '../../lib/units/display';
import Cautions from './Cautions';
import { CARD_PARAMETERS, PARAMETER_QUANTITY } from './parameter-display';
import { useApi } from './use-api';

interface CompareSiteTestProps {
  query: string;
  system: DisplaySystem;
}

interface Row {
  id: number;
  parameter: ParameterKey;
  text: string;
}

const ordinal = (n: number) => {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  return `${n}${['th', 'st', 'nd', 'rd'][n % 10] ?? 'th'}`;
};

/** Numbers typed or pasted (commas, spaces, semicolons or new lines between them), in the person's units. */
export function readValues(text: string): number[] | null {
  const parts = text.split(/[\s,;]+/).filter(Boolean);
  const values = parts.map(Number);
  return parts.length > 0 && values.every(Number.isFinite) ? values : null;
}

function Result({ comparison, shown, system }: { comparison: Json<SiteComparison>; shown: number[]; system: DisplaySystem }) {
  const kind = PARAMETER_QUANTITY[comparison.parameter];
  const against =
    comparison.basis === 'pooled'
      ? 'the pooled tests of every firm (masked values)'
      : comparison.basis === 'own'
        ? "your firm's tests only: the pooled figures are withheld here"
        : 'nothing: no tests of this parameter here';
  return (
    <div className="panel p-3" data-testid={`compare-${comparison.parameter}`}>
      <p className="font-semibold text-ink-800">
        {PARAMETERS[comparison.parameter].symbol}{' '}
        <span className="text-xs font-normal text-ink-500">compared with {against}</span>
      </p>
      <table className="mt-1 w-full text-sm">
        <thead>
          <tr className="text-left text-xs text-ink-500">
            <th className="py-1">{headerWithUnit('Site value', kind, system)}</th>
            <th>Percentile</th>
            <th>Outlier</th>
            <th>Tests compared</th>
          </tr>
        </thead>
        <tbody>
          {comparison.results.map((result, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: one row per value sent, in the order sent; the list never reorders
            <tr key={`${i}-${shown[i]}`} className="border-t border-ink-100" data-testid="compare-row">
              <td className="py-1">{formatQuantity(toSi(shown[i] as number, kind, system), kind, system)}</td>
              <td data-testid="compare-percentile">
                {result?.percentile === null || !result ? '—' : `${ordinal(Math.round(result.percentile))}`}
              </td>
              <td data-testid="compare-outlier">
                {result?.outlier ? (
                  <span className="tag bg-fault-500 text-white">
                    {result.outlier === 'high' ? 'far above (beyond Q3 + 3 IQR)' : 'far below (beyond Q1 − 3 IQR)'}
                  </span>
                ) : (
                  'no'
                )}
              </td>
              <td>{result?.poolSize ?? 0}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Type or paste a few of your own site results and see where each sits in this selection's distribution. */
export default function CompareSiteTest({ query, system }: CompareSiteTestProps) {
  const [rows, setRows] = useState<Row[]>([{ id: 0, parameter: 'compressionIndex', text: '' }]);
  const [sent, setSent] = useState<{ body: unknown; shown: Partial<Record<ParameterKey, number[]>> } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const state = useApi<Json<CompareAnswer>>(sent ? `/api/statistics/compare?${query}` : null, sent?.body);
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    const values: Partial<Record<ParameterKey, number[]>> = {};
    const shown: Partial<Record<ParameterKey, number[]>> = {};
    for (const row of rows) {
      if (!row.text.trim()) continue;
      const parsed = readValues(row.text);
      if (!parsed) {
        setProblem(`Write the ${PARAMETERS[row.parameter].symbol} values as numbers separated by commas or spaces.`);
        return;
      }
      const kind = PARAMETER_QUANTITY[row.parameter];
      values[row.parameter] = [...(values[row.parameter] ?? []), ...parsed.map((v) => toSi(v, kind, system))];
      shown[row.parameter] = [...(shown[row.parameter] ?? []), ...parsed];
    }
    const checked = compareBodySchema.safeParse({ values });
    if (!checked.success) {
      setProblem(checked.error.issues[0]?.message ?? 'Give at least one site value to compare.');
      return;
    }
    setProblem(null);
    setSent({ body: checked.data, shown });
  };
  return (
    <div className="space-y-3">
      <form className="panel space-y-2 p-3" onSubmit={submit} aria-label="Site results to compare">
        <p className="text-sm text-ink-700">
          Type or paste one or a few of your own results. Each is placed in this selection's distribution: its percentile, and a
          flag when it lies beyond the far-out fences (3 × IQR beyond the quartiles), as the stewards' review does.
        </p>
        {rows.map((row, index) => {
          const kind = PARAMETER_QUANTITY[row.parameter];
          return (
            <div key={row.id} className="flex flex-wrap items-end gap-2">
              <label className="flex flex-col text-xs text-ink-600">
                Parameter
                <select
                  className="rounded border border-ink-200 px-2 py-1 text-sm"
                  value={row.parameter}
                  onChange={(e) =>
                    setRows(rows.map((r, i) => (i === index ? { ...r, parameter: e.target.value as ParameterKey } : r)))
                  }
                  data-testid={`compare-parameter-${index}`}
                >
                  {CARD_PARAMETERS.map((key) => (
                    <option key={key} value={key}>
                      {headerWithUnit(PARAMETERS[key].symbol, PARAMETER_QUANTITY[key], system)}
                    </option>
                  ))}
                </select>
              </label>
              <label className="flex flex-1 flex-col text-xs text-ink-600">
                {headerWithUnit('Values', kind, system)}
                <input
                  className="rounded border border-ink-200 px-2 py-1 text-sm"
                  value={row.text}
                  placeholder="e.g. 0.82, 1.35"
                  onChange={(e) => setRows(rows.map((r, i) => (i === index ? { ...r, text: e.target.value } : r)))}
                  data-testid={`compare-values-${index}`}
                />
              </label>
            </div>
          );
        })}
        <div className="flex gap-2">
          <button
            type="button"
            className="btn-quiet"
            onClick={() => setRows([...rows, { id: rows.length, parameter: 'cvNcM2PerYear', text: '' }])}
          >
            Add a parameter
          </button>
          <button type="submit" className="btn-primary" data-testid="compare-submit">
            Compare
          </button>
        </div>
        {problem && (
          <p className="text-sm text-fault-700" role="alert">
            {problem}
          </p>
        )}
      </form>
      {sent && state.status === 'loading' && <p className="text-sm text-ink-500">Comparing…</p>}
      {sent && state.status === 'failed' && (
        <p className="text-sm text-fault-700" role="alert">
          {state.message}
        </p>
      )}
      {sent && state.status === 'ready' && (
        <div className="space-y-2" data-testid="compare-results">
          {state.data.comparisons.map((comparison) => (
            <Result
              key={comparison.parameter}
              comparison={comparison}
              shown={sent.shown[comparison.parameter] ?? []}
              system={system}
            />
          ))}
          <Cautions cautions={state.data.cautions} />
        </div>
      )}
    </div>
  );
}
