import { useEffect, useState } from 'react';

interface KeyUsageProps {
  /** the first characters of one of the firm's keys, e.g. "cbk_Ab3x" */
  keyStart: string | null;
}

/** How a partner script uses a key: the endpoint, the header, a curl example for CSV and for JSON. */
export default function KeyUsage({ keyStart }: KeyUsageProps) {
  const [origin, setOrigin] = useState('');
  useEffect(() => setOrigin(window.location.origin), []);
  const key = `${keyStart ?? 'cbk_'}…`;
  return (
    <details className="border-t border-ink-100 px-4 py-3 text-sm" data-testid="key-usage">
      <summary className="cursor-pointer font-medium text-ink-800">How a script uses a key</summary>
      <p className="mt-2 text-ink-700">
        Send the key in the <code>x-api-key</code> header to <code>POST /api/partner/submissions</code>: the CSV template's
        columns as the body (<code>Content-Type: text/csv</code>) or JSON rows keyed by field name in SI units (
        <code>Content-Type: application/json</code>). The upload is checked like one from Contribute and stored whole or not at
        all.
      </p>
      <pre className="mt-2 overflow-x-auto rounded bg-ink-900 p-3 font-mono text-xs text-ink-50">
        <code>{`curl -X POST "${origin}/api/partner/submissions?delimiter=comma" \\
  -H "x-api-key: ${key}" -H "Content-Type: text/csv" --data-binary @results.csv`}</code>
      </pre>
      <pre className="mt-2 overflow-x-auto rounded bg-ink-900 p-3 font-mono text-xs text-ink-50">
        <code>{`curl -X POST ${origin}/api/partner/submissions \\
  -H "x-api-key: ${key}" -H "Content-Type: application/json" \\
  -d '{ "rows": [{ "boreholeId": "BH-1", "region": "Saltreach Estuary", "geologicalUnit": "Saltreach Estuarine Clay",
        "depthTop": 4.5, "depthBottom": 4.9, "compressionIndex": 0.82 }] }'`}</code>
      </pre>
      <p className="mt-2 text-ink-700">
        Replace <code>{key}</code> with the whole key you copied when you created it. The <a href="/api-guide">API page</a> lists
        every field, the answers and the errors.
      </p>
    </details>
  );
}
