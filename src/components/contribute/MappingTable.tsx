import { type CsvTable, columnLetter, FIELD_BY_KEY, UNIT_CHOICES } from '../../lib/import';
import { PANEL_TABLE_CLASS } from '../firm/panel-table';
import type { ColumnChoice } from './column-choices';
import FieldSelect from './FieldSelect';

interface MappingTableProps {
  table: CsvTable;
  choices: ColumnChoice[];
  onField(column: number, field: string | null): void;
  onUnit(column: number, unit: string): void;
}

const SOURCE_TEXT: Readonly<Record<string, string>> = {
  remembered: 'as last time',
  header: 'by its name',
  you: 'your choice',
};

/** Each column of the file → a Claybank field and, where the field has one, the unit the column is written in. */
export default function MappingTable({ table, choices, onField, onUnit }: MappingTableProps) {
  const samples = table.rows.slice(0, 2);
  return (
    <div className="relative max-h-[32rem] overflow-auto rounded border border-ink-200">
      <table className={PANEL_TABLE_CLASS} data-testid="mapping-table">
        <thead className="sticky top-0 z-10">
          <tr>
            <th scope="col">Col.</th>
            <th scope="col">Header in the file</th>
            <th scope="col">First values</th>
            <th scope="col" className="w-64">
              Claybank field
            </th>
            <th scope="col" className="w-28">
              Unit
            </th>
            <th scope="col">Goes to</th>
            <th scope="col">Matched</th>
          </tr>
        </thead>
        <tbody>
          {table.headers.map((header, column) => {
            const choice = choices[column];
            const field = choice?.field ? FIELD_BY_KEY.get(choice.field) : undefined;
            const unitKind = field?.unitKind ?? 'none';
            return (
              <tr key={header} data-testid="mapping-row" className={field ? '' : 'text-ink-500'}>
                <td className="text-xs text-ink-500">{columnLetter(column)}</td>
                <td className="font-medium" data-testid="mapping-header">
                  {header}
                </td>
                <td
                  className="max-w-[12rem] truncate text-xs text-ink-600"
                  title={samples.map((r) => r.cells[column]).join(' | ')}
                >
                  {samples
                    .map((r) => r.cells[column] ?? '')
                    .filter((cell) => cell.trim() !== '')
                    .join(' · ')}
                </td>
                <td>
                  <FieldSelect
                    id={`mapping-field-${column}`}
                    label={`Claybank field for column ${columnLetter(column)} (${header})`}
                    value={choice?.field ?? null}
                    onChange={(next) => onField(column, next)}
                  />
                </td>
                <td>
                  {unitKind !== 'none' ? (
                    <>
                      <label htmlFor={`mapping-unit-${column}`} className="sr-only">
                        Unit of column {columnLetter(column)}
                      </label>
                      <select
                        id={`mapping-unit-${column}`}
                        className="w-full rounded border border-ink-300 bg-white px-1 py-0.5 text-sm"
                        value={choice?.unit ?? ''}
                        onChange={(event) => onUnit(column, event.target.value)}
                        data-testid="mapping-unit"
                      >
                        {UNIT_CHOICES[unitKind].map((unit) => (
                          <option key={unit.id} value={unit.id}>
                            {unit.label}
                          </option>
                        ))}
                      </select>
                    </>
                  ) : (
                    <span className="text-xs text-ink-400">{choice?.field?.endsWith('Pct') ? '%' : '—'}</span>
                  )}
                </td>
                <td>
                  {field && (
                    <span
                      className={`tag ${field.scope === 'private' ? 'bg-tide-100 text-tide-800' : 'bg-ink-100 text-ink-600'}`}
                    >
                      {field.scope}
                    </span>
                  )}
                </td>
                <td className="max-w-[14rem] text-xs" data-testid="mapping-source">
                  <span className="whitespace-nowrap text-ink-600">
                    {choice?.source ? SOURCE_TEXT[choice.source] : field ? '' : 'no match'}
                  </span>
                  {choice?.note && <p className="text-caution-700">{choice.note}</p>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
