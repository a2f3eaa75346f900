import { useMemo, useState } from 'react';
import { fieldUnitLabel } from '../../lib/import/field-labels';
import type { UploadOptions } from '../../lib/schemas/upload-options';
import Ags4Step from './Ags4Step';
import CheckStep from './CheckStep';
import { columnUnitOf, mappingOptions, missingRequired, unitLabelOf } from './column-choices';
import FileStep from './FileStep';
import MappingStep from './MappingStep';
import { fieldHeading } from './record-fields';
import SharedPreview from './SharedPreview';
import StoredNotice from './StoredNotice';
import SubmitStep from './SubmitStep';
import { useCellEdits } from './use-cell-edits';
import { useFileChoice } from './use-file-choice';
import { useUploadRun } from './use-upload-run';

/** The upload, step by step: file → columns (or AGS4 region and geology) → check and correct → what others see → submit. */
export default function UploadWorkspace() {
  const [region, setRegion] = useState('');
  const [remember, setRemember] = useState(true);
  const run = useUploadRun();
  const { check, problems, busy, stored } = run;
  const choice = useFileChoice(run.reset);
  const { read, choices, format } = choice;

  const csvRows = useMemo(() => (read.kind === 'csv' ? new Map(read.table.rows.map((r) => [r.row, r.cells])) : null), [read]);
  const agsRows = useMemo(() => (read.kind === 'ags4' ? new Map(read.rows.map((r) => [r.row, r.values])) : null), [read]);
  const regionMapped = choices.some((c) => c.field === 'region');

  const fileText = (row: number, field: string): string => {
    if (agsRows) {
      const value = (agsRows.get(row) as Record<string, unknown> | undefined)?.[field];
      return value === null || value === undefined ? '' : String(value);
    }
    const column = choices.findIndex((c) => c.field === field);
    return column < 0 ? '' : (csvRows?.get(row)?.[column] ?? '');
  };
  const edits = useCellEdits(fileText);

  const heading = (field: string) =>
    read.kind === 'csv'
      ? fieldHeading(field, unitLabelOf(field, columnUnitOf(choices, field)) ?? fieldUnitLabel(field))
      : fieldHeading(field);

  const options: Partial<UploadOptions> =
    read.kind === 'ags4'
      ? { format: 'ags4', edits: edits.edits, region, geologyMap: choice.geologyMap }
      : {
          format: 'csv',
          delimiter: read.kind === 'csv' ? read.table.delimiter : undefined,
          ...mappingOptions(choices),
          edits: edits.edits,
          ...(!regionMapped && region ? { region } : {}),
        };
  const missing = read.kind === 'csv' ? missingRequired(choices, region !== '') : [];
  const canCheck = (read.kind === 'csv' && missing.length === 0) || (read.kind === 'ags4' && region !== '');
  const stale = check !== null && check.key !== JSON.stringify(options);
  const ready = check !== null && !stale && problems.length === 0 && check.result.validCount > 0;

  if (stored) {
    return <StoredNotice stored={stored} fileName={choice.file?.name ?? 'The file'} onAnother={() => window.location.reload()} />;
  }

  const regionNames = choice.vocabulary?.regions.map((r) => r.name) ?? [];
  return (
    <div className="space-y-4" data-testid="upload-workspace">
      <FileStep
        file={choice.file}
        format={format}
        chosenDelimiter={choice.chosenDelimiter}
        read={read}
        onFile={(file) => {
          edits.clear();
          choice.chooseFile(file);
        }}
        onFormat={choice.chooseFormat}
        onDelimiter={choice.chooseDelimiter}
      />
      {read.kind === 'csv' && (
        <MappingStep
          table={read.table}
          choices={choices}
          missing={missing}
          regionMapped={regionMapped}
          region={region}
          regionNames={regionNames}
          remember={remember}
          onField={choice.chooseField}
          onUnit={choice.chooseUnit}
          onRegion={setRegion}
          onRemember={setRemember}
        />
      )}
      {read.kind === 'ags4' && (
        <Ags4Step
          notices={read.notices}
          geologyCodes={read.geologyCodes}
          geologyMap={choice.geologyMap}
          region={region}
          regionNames={regionNames}
          unitNames={choice.vocabulary?.units.map((u) => u.name) ?? []}
          onRegion={setRegion}
          onGeology={choice.chooseGeology}
        />
      )}
      {(read.kind === 'csv' || read.kind === 'ags4') && (
        <>
          <CheckStep
            check={check?.result ?? null}
            problems={problems}
            stale={stale}
            busy={busy === 'checking'}
            failure={run.checkFailure}
            edits={edits.list}
            canCheck={canCheck}
            onCheck={() => choice.file && void run.runCheck(choice.file, options)}
            onUndo={edits.undo}
            cellText={edits.textOf}
            heading={heading}
            onEdit={edits.set}
          />
          <SharedPreview check={check?.result ?? null} />
          <SubmitStep
            ready={ready}
            busy={busy === 'submitting'}
            rowCount={check?.result.rowCount ?? 0}
            failure={run.submitFailure}
            onSubmit={() => choice.file && void run.submit(choice.file, { ...options, remember: format === 'csv' && remember })}
          />
        </>
      )}
    </div>
  );
}
