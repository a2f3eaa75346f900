import Papa from 'papaparse';
import { IMPORT_FIELDS } from '../../src/lib/import/fields';
import { templateHeader } from '../../src/lib/import/template';
import type { DemoRecordFields } from './generate-records';

/**
 * The invented demo records as CSV in the import template's layout (src/lib/import/template.ts): one
 * column per import field in the order of fields.ts, headed as the template heads it ("Depth top (m)",
 * "σ'p (kPa)", "cv (NC range) (m²/yr)"), values in the bank's SI units, blank cells for missing values,
 * a UTF-8 byte-order mark and CRLF line ends. Firm, quality class, increments and the outlier mark are
 * not import columns and are left out.
 */
export function recordsToCsv(records: readonly DemoRecordFields[]): string {
  const rows = records.map((record) => {
    const values: Readonly<Record<string, unknown>> = { ...record };
    return IMPORT_FIELDS.map((field) => {
      const value = values[field.key];
      return value === null || value === undefined ? '' : String(value);
    });
  });
  const csv = Papa.unparse({ fields: IMPORT_FIELDS.map(templateHeader), data: rows }, { delimiter: ',', newline: '\r\n' });
  return `\uFEFF${csv}\r\n`;
}
