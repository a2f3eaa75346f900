import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { generateDemoRecords } from '../../../scripts/demo/generate-records';
import { recordsToCsv } from '../../../scripts/demo/records-csv';
import { IMPORT_FIELDS } from '../../../src/lib/import/fields';
import { templateCsv } from '../../../src/lib/import/template';

const records = generateDemoRecords({ seed: 11, count: 60 });
const parsed = Papa.parse<string[]>(recordsToCsv(records), { delimiter: ',', skipEmptyLines: true });
const [header = [], ...rows] = parsed.data;

describe('recordsToCsv', () => {
  it('heads the columns with the import field labels and the SI unit in brackets', () => {
    expect(parsed.errors).toEqual([]);
    const templateHeaderLine = templateCsv().split('\r\n')[0];
    expect(recordsToCsv(records).split('\r\n')[0]).toBe(templateHeaderLine);
    expect(header).toEqual(
      expect.arrayContaining([
        'Borehole / location id',
        'Depth top (m)',
        'Depth bottom (m)',
        'Easting (m)',
        'wn (%)',
        'Bulk unit weight (kN/m³)',
        "σ'p (kPa)",
        "σ'v0 (kPa)",
        'cv (NC range) (m²/yr)',
        'cv (OC range) (m²/yr)',
        'mv (m²/MN)',
        'k (m/s)',
        'Cc',
        'Δe/e0',
      ]),
    );
  });

  it('writes one row per record, numbers as written, blanks for missing values, nothing beyond the import fields', () => {
    expect(rows).toHaveLength(records.length);
    const column = (key: string) => IMPORT_FIELDS.findIndex((f) => f.key === key);
    records.forEach((record, i) => {
      const row = rows[i] ?? [];
      expect(row).toHaveLength(IMPORT_FIELDS.length);
      expect(row[column('boreholeId')]).toBe(record.boreholeId);
      expect(row[column('projectName')]).toBe(record.projectName);
      expect(Number(row[column('depthTop')])).toBe(record.depthTop);
      expect(Number(row[column('compressionIndex')])).toBe(record.compressionIndex);
      expect(Number(row[column('permeability')])).toBe(record.permeability);
      expect(row[column('locationCell')]).toBe('');
      expect(row[column('liquidLimitPct')]).toBe(record.liquidLimitPct === null ? '' : String(record.liquidLimitPct));
    });
    expect(header.join(',')).not.toMatch(/firm|outlier|increment/i);
  });

  it('gives an empty template (header only) for no records', () => {
    const lines = recordsToCsv([])
      .split('\r\n')
      .filter((line) => line !== '');
    expect(lines).toHaveLength(1);
  });
});
