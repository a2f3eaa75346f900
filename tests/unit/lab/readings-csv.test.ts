import { describe, expect, it } from 'vitest';
import { formatRowError } from '../../../src/lib/import/errors';
import { KPA_PER_PSF } from '../../../src/lib/import/units';
import { interpretIncrementalTest } from '../../../src/lib/lab/interpret-incremental';
import { readReadingsCsv } from '../../../src/lib/lab/readings-csv/read-readings';
import { readingsColumnGuide, readingsTemplateCsv } from '../../../src/lib/lab/readings-csv/readings-template';

function read(increments: string, timeReadings?: string) {
  const result = readReadingsCsv(timeReadings === undefined ? { increments } : { increments, timeReadings });
  if (!result.ok) throw new Error(`${result.error.code}: ${result.error.message}`);
  return result;
}

describe('the readings template', () => {
  const text = readingsTemplateCsv();

  it('holds an invented test with its increments, then a time-readings section', () => {
    expect(
      text.startsWith('\uFEFFTest,Increment,Applied stress (kPa),Deformation at end (mm),Void ratio at end,Initial height (mm),'),
    ).toBe(true);
    expect(text).toContain('\r\n\r\n[time readings]\r\nTest,Increment,Elapsed time (min),Deformation (mm)\r\n');
    expect(text).toContain('(invented)');
  });

  it('reads back cleanly and gives the parameters it was made from', () => {
    const result = read(text);
    expect(result.rowErrors).toEqual([]);
    expect(result.notices).toEqual([]);
    expect(result.tests).toHaveLength(1);
    const [test] = result.tests;
    expect(test?.increments.map((i) => i.stressKpa)).toEqual([12.5, 25, 50, 100, 200, 400, 800, 200, 50]);
    expect(test?.increments.filter((i) => i.readings).map((i) => [i.incrementNo, i.readings?.length])).toEqual([
      [5, 15],
      [6, 15],
    ]);
    if (!test) return;
    // made from Cc 0.85, Cr 0.09, σ′p 72 kPa, cv 1.2 m²/yr (see readingsTemplateCsv)
    const r = interpretIncrementalTest(test, {}, { verticalEffectiveStressKpa: 55 });
    expect(r.cc.ok && Math.abs(r.cc.value.value / 0.85 - 1)).toBeLessThan(0.05);
    expect(r.cr.ok && Math.abs(r.cr.value.value / 0.09 - 1)).toBeLessThan(0.05);
    expect(r.sigmaPCasagrande.ok && Math.abs(r.sigmaPCasagrande.value.sigmaPKpa / 72 - 1)).toBeLessThan(0.1);
    const cv = r.increments[4]?.rootTime;
    expect(cv?.ok && Math.abs(cv.value.cvM2PerYear / 1.2 - 1)).toBeLessThan(0.05);
  });

  it('guides every column with its units', () => {
    const guide = readingsColumnGuide();
    expect(guide.find((g) => g.key === 'deformationMm' && g.section === 'time readings')).toMatchObject({
      column: 'Deformation (mm)',
      required: true,
      units: ['mm', 'µm', 'cm', 'in'],
    });
    expect(guide.find((g) => g.key === 'elapsedMin')?.units).toEqual(['min', 's', 'h', 'day']);
    expect(guide.filter((g) => g.required).map((g) => `${g.section}:${g.key}`)).toEqual([
      'increments:incrementNo',
      'increments:stressKpa',
      'time readings:incrementNo',
      'time readings:elapsedMin',
      'time readings:deformationMm',
    ]);
  });
});

describe('reading a readings file', () => {
  it('matches header synonyms and converts units written in the header', () => {
    const result = read(
      'Specimen,Stage,Pressure (psf),Settlement (in),Height (in),e0\nA,1,1000,0.01,0.75,1.2\nA,2,2000,0.02,,\n',
    );
    const [test] = result.tests;
    expect(test?.testId).toBe('A');
    // source: 1 psf = 0.047880 kPa, 1 in = 25.4 mm (NIST SP 811 (2008), Appendix B)
    expect(test?.increments[0]?.stressKpa).toBeCloseTo(1000 * KPA_PER_PSF, 9);
    expect(test?.increments[1]?.deformationMm).toBeCloseTo(0.508, 12);
    expect(test?.specimen.initialHeightMm).toBeCloseTo(19.05, 12);
    expect(test?.specimen.initialVoidRatio).toBe(1.2);
  });

  it('takes the time readings from a second file, in seconds and micrometres', () => {
    const result = read(
      'Increment,Applied stress (kPa),Deformation at end (mm),Initial height (mm),e0\n1,50,0.2,20,1.5\n',
      'Increment,Time (s),Deformation (µm)\n1,6,50\n1,60,120\n',
    );
    expect(result.tests[0]?.increments[0]?.readings).toEqual([
      { elapsedMin: 0.1, deformationMm: 0.05 },
      { elapsedMin: 1, deformationMm: 0.12 },
    ]);
  });

  it('reads decimal commas in a semicolon-separated file', () => {
    const result = read('Increment;Applied stress (kPa);Void ratio at end;e0\n1;12,5;1,45;1,5\n2;25;1,42;\n');
    expect(result.tests[0]?.increments.map((i) => [i.stressKpa, i.voidRatio])).toEqual([
      [12.5, 1.45],
      [25, 1.42],
    ]);
  });

  it('keeps several tests apart by their Test cell', () => {
    const result = read(
      'Test,Increment,Applied stress (kPa),Void ratio at end,e0\nT1,1,50,1.4,1.5\nT2,1,50,0.9,1\nT1,2,100,1.3,\n',
    );
    expect(result.tests.map((t) => [t.testId, t.increments.length, t.specimen.initialVoidRatio])).toEqual([
      ['T1', 2, 1.5],
      ['T2', 1, 1],
    ]);
  });

  it('names the spreadsheet row of each problem, in both sections, and leaves the test out', () => {
    const text = [
      'Test,Increment,Applied stress (kPa),Deformation at end (mm),Initial height (mm),e0',
      'T1,1,50,0.2,20,1.5',
      'T1,1,100,0.5,,',
      'T1,3,abc,0.9,,',
      'T1,4,400,,21,',
      '',
      '[time readings]',
      'Test,Increment,Elapsed time (min),Deformation (mm)',
      'T1,1,0.1,0.01',
      'T1,9,0.1,0.3',
      'T1,1,0.1,0.02',
    ].join('\n');
    const result = read(text);
    expect(result.tests).toEqual([]);
    expect(result.rowErrors.map((e) => [e.section, formatRowError(e, (f) => f)])).toEqual([
      [
        'increments',
        'Row 4, stressKpa: Applied stress: "abc" is not a number; enter a plain number such as 1.25, or leave the cell blank.',
      ],
      ['increments', 'Row 3, incrementNo: increment 1 is also on row 2.'],
      ['increments', 'Row 5, initialHeightMm: differs from row 2 (20); give one value per test.'],
      ['increments', 'Row 5, deformationMm: give the deformation at the end of the increment, or the void ratio.'],
      ['time readings', 'Row 10, incrementNo: the test has no increment 9 in the increments table.'],
      ['time readings', 'Row 11, elapsedMin: increment 1 already has a reading at 0.1 min.'],
    ]);
  });

  it('refuses a file without a required column, or with a unit it cannot convert', () => {
    const missing = readReadingsCsv({ increments: 'Increment,Deformation (mm)\n1,0.1\n' });
    expect(missing).toEqual({
      ok: false,
      error: { code: 'READINGS_COLUMNS', message: 'Increments: no column for Applied stress; add it (see the template).' },
    });
    const wrong = readReadingsCsv({ increments: 'Increment,Applied stress (mm)\n1,0.1\n' });
    expect(!wrong.ok && wrong.error.message).toBe(
      'Increments: column 2 (B) "Applied stress (mm)" gives a unit Claybank cannot convert for Applied stress; use kPa, psf, tsf or MPa.',
    );
    const empty = readReadingsCsv({ increments: '' });
    expect(empty).toMatchObject({ ok: false, error: { code: 'EMPTY_FILE' } });
  });

  it('lists columns it does not read', () => {
    const result = read('Increment,Applied stress (kPa),Void ratio at end,e0,Operator\n1,50,1.4,1.5,JB\n');
    expect(result.notices).toEqual(['Increments: column 5 (E) "Operator" is not a readings column and was not read.']);
  });

  it('asks for the initial height when deformations are given', () => {
    const result = read('Increment,Applied stress (kPa),Deformation at end (mm),e0\n1,50,0.2,1.5\n2,100,0.4,\n');
    expect(result.rowErrors.map((e) => e.message)).toEqual([
      'deformations are given, so the initial height of the specimen is needed.',
    ]);
  });
});
