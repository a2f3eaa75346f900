import { PANEL_TABLE_CLASS } from '../firm/panel-table';
import StepPanel from './StepPanel';
import VocabularySelect from './VocabularySelect';

interface Ags4StepProps {
  notices: string[];
  geologyCodes: string[];
  geologyMap: Record<string, string>;
  region: string;
  regionNames: string[];
  unitNames: string[];
  onRegion(region: string): void;
  onGeology(code: string, unitName: string): void;
}

/** Step 2 (AGS4): the region of the whole file and which geological unit each geology code stands for. */
export default function Ags4Step({ notices, geologyCodes, geologyMap, region, regionNames, unitNames, ...on }: Ags4StepProps) {
  return (
    <StepPanel
      step={2}
      title="Region and geology"
      lead="AGS4 files name neither the region nor the bank's geological units; give them here."
      testId="ags4-step"
    >
      <div className="max-w-sm">
        <VocabularySelect
          id="upload-region"
          label="Region of every test in the file"
          value={region}
          names={regionNames}
          placeholder="Choose the region…"
          onChange={on.onRegion}
          testId="upload-region"
        />
      </div>
      {geologyCodes.length > 0 && (
        <div className="relative overflow-x-auto rounded border border-ink-200">
          <table className={PANEL_TABLE_CLASS} data-testid="geology-table">
            <thead>
              <tr>
                <th scope="col">Geology code in the file (GEOL_GEOL)</th>
                <th scope="col">Geological unit in the bank</th>
              </tr>
            </thead>
            <tbody>
              {geologyCodes.map((code) => (
                <tr key={code}>
                  <td className="font-medium">{code}</td>
                  <td>
                    <label htmlFor={`geology-${code}`} className="sr-only">
                      Geological unit for {code}
                    </label>
                    <select
                      id={`geology-${code}`}
                      className="rounded border border-ink-300 bg-white px-1 py-0.5 text-sm"
                      value={geologyMap[code] ?? ''}
                      onChange={(event) => on.onGeology(code, event.target.value)}
                      data-testid="geology-select"
                    >
                      <option value="">Use “{code}” as written</option>
                      {unitNames.map((name) => (
                        <option key={name} value={name}>
                          {name}
                        </option>
                      ))}
                    </select>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {notices.length > 0 && (
        <details className="text-sm text-ink-600">
          <summary className="cursor-pointer">{notices.length} remarks on what was not read</summary>
          <ul className="mt-1 list-disc pl-5 text-xs">
            {notices.map((notice) => (
              <li key={notice}>{notice}</li>
            ))}
          </ul>
        </details>
      )}
    </StepPanel>
  );
}
