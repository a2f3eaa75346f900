import { type CsvTable, FIELD_BY_KEY } from '../../lib/import';
import type { ColumnChoice } from './column-choices';
import MappingTable from './MappingTable';
import StepPanel from './StepPanel';
import VocabularySelect from './VocabularySelect';

interface MappingStepProps {
  table: CsvTable;
  choices: ColumnChoice[];
  missing: string[];
  regionMapped: boolean;
  region: string;
  regionNames: string[];
  remember: boolean;
  onField(column: number, field: string | null): void;
  onUnit(column: number, unit: string): void;
  onRegion(region: string): void;
  onRemember(remember: boolean): void;
}

/** Step 2 (CSV): what each column holds and in which unit; the region for the whole file when no column gives it. */
export default function MappingStep(props: MappingStepProps) {
  const { table, choices, missing, regionMapped, region, regionNames, remember } = props;
  const matched = choices.filter((c) => c.field).length;
  return (
    <StepPanel
      step={2}
      title="Match the columns"
      lead="Matched from the headers and your firm's earlier choices. Change any field or unit that is wrong."
      testId="mapping-step"
    >
      <p className="text-sm text-ink-700" data-testid="mapping-summary">
        {matched} of {table.headers.length} columns matched to Claybank fields; the rest are not imported.
      </p>
      {missing.length > 0 && (
        <p
          className="rounded border border-caution-300 bg-caution-50 px-3 py-2 text-sm text-caution-900"
          data-testid="mapping-missing"
        >
          No column gives: {missing.map((key) => FIELD_BY_KEY.get(key)?.label ?? key).join(', ')}. Choose the column that holds
          each{missing.includes('region') ? ', or give the region for the whole file below' : ''}.
        </p>
      )}
      <MappingTable table={table} choices={choices} onField={props.onField} onUnit={props.onUnit} />
      {!regionMapped && (
        <div className="max-w-sm">
          <VocabularySelect
            id="upload-region"
            label="Region of every row"
            value={region}
            names={regionNames}
            placeholder="Choose the region…"
            hint="The file has no region column, so every test is placed in this region."
            onChange={props.onRegion}
            testId="upload-region"
          />
        </div>
      )}
      <label className="inline-flex items-center gap-2 text-sm">
        <input type="checkbox" checked={remember} onChange={(event) => props.onRemember(event.target.checked)} />
        Remember these column choices for your firm's next upload (saved when you submit)
      </label>
    </StepPanel>
  );
}
