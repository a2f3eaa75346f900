import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type Ags4Options, readAgs4 } from '../../../src/lib/import/ags4';
import { STANDARD_GRAVITY } from '../../../src/lib/import/ags4-units';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { fixture, VOCABULARY } from '../../fixtures/import/pipeline';

const OPTIONS: Ags4Options = { region: 'Saltreach Estuary', geologyMap: { SEC: 'Saltreach Estuarine Clay' } };

function read(input: Uint8Array | string, options = OPTIONS) {
  const result = readAgs4(input, options);
  if (!result.ok) throw new Error(`${result.error.code}: ${result.error.message}`);
  return result;
}

const q = (...fields: string[]) => fields.map((f) => `"${f}"`).join(',');

/** A small AGS4 text: one test, with the CONG and CONS units given. */
function smallAgs({ stressUnit = 'kPa', stress = '100', depthUnit = 'm', top = '4.00', cvUnit = 'm2/yr' } = {}) {
  const key = ['BH1', top, '1', 'U', 'S1', '1', ''];
  return [
    q('GROUP', 'GEOL'),
    q('HEADING', 'LOCA_ID', 'GEOL_TOP', 'GEOL_BASE', 'GEOL_GEOL'),
    q('UNIT', '', 'm', 'm', ''),
    q('TYPE', 'ID', '2DP', '2DP', 'PA'),
    q('DATA', 'BH1', '0.00', '20.00', 'SEC'),
    '',
    q('GROUP', 'CONG'),
    q('HEADING', 'LOCA_ID', 'SAMP_TOP', 'SAMP_REF', 'SAMP_TYPE', 'SAMP_ID', 'SPEC_REF', 'SPEC_DPTH', 'CONG_HIGT', 'CONG_IVR'),
    q('UNIT', '', depthUnit, '', '', '', '', depthUnit, 'mm', ''),
    q('TYPE', 'ID', '2DP', 'X', 'PA', 'ID', 'X', '2DP', '1DP', '3DP'),
    q('DATA', ...key, '20.0', '1.500'),
    '',
    q('GROUP', 'CONS'),
    q(
      'HEADING',
      'LOCA_ID',
      'SAMP_TOP',
      'SAMP_REF',
      'SAMP_TYPE',
      'SAMP_ID',
      'SPEC_REF',
      'SPEC_DPTH',
      'CONS_INCN',
      'CONS_INCF',
      'CONS_INCE',
      'CONS_CVRT',
    ),
    q('UNIT', '', depthUnit, '', '', '', '', depthUnit, '', stressUnit, '', cvUnit),
    q('TYPE', 'ID', '2DP', 'X', 'PA', 'ID', 'X', '2DP', '0DP', '1DP', '3DP', '2DP'),
    q('DATA', ...key, '1', stress, '1.400', '2.00'),
  ].join('\r\n');
}

describe('reading AGS4 files', () => {
  it('reads the invented fixture into one row per CONG record', () => {
    const { rows, geologyCodes } = read(fixture('invented-two-boreholes.ags'));
    expect(rows.map((r) => [r.row, r.values.boreholeId, r.values.sampleId, r.values.depthTop, r.values.depthBottom])).toEqual([
      [80, 'QF-BH-01', 'BH01-UT4 / 1', 4, 4.45],
      [81, 'QF-BH-01', 'BH01-UT7 / 1', 9, 9.45],
      [82, 'QF-BH-02', 'BH02-P3 / 1', 5.5, 6.1],
    ]);
    expect(geologyCodes).toEqual(['MG', 'SAND', 'SEC']);
    const [first, second, third] = rows;
    expect(first?.values).toMatchObject({
      projectName: 'Quayside Relief Road (invented)',
      clientName: 'Saltreach Harbour Board (invented)',
      easting: 412_310,
      northing: 286_720,
      coordinateSystem: 'Saltreach local grid (invented)',
      region: 'Saltreach Estuary',
      geologicalUnit: 'Saltreach Estuarine Clay',
      samplingMethod: 'thin-wall open-tube (UT)',
      waterContentPct: 72,
      liquidLimitPct: 78,
      plasticLimitPct: 31,
      plasticityIndexPct: 47,
      specificGravity: 2.65,
      initialVoidRatio: 1.95,
      testMethod: 'incremental',
      testStandard: 'ASTM D2435 method B',
    });
    // bulk unit weight = bulk density × standard gravity; source: NIST SP 811 (2008), Appendix B (gn = 9.80665 m/s²)
    expect(first?.values.bulkUnitWeight).toBeCloseTo(1.58 * STANDARD_GRAVITY, 12);
    expect(second?.values.specificGravity).toBe(2.69);
    expect(third?.values).toMatchObject({ waterContentPct: 88, samplingMethod: 'piston (P)' });
    expect(third?.values.bulkUnitWeight).toBeCloseTo(1.52 * STANDARD_GRAVITY, 12);
    expect(first?.increments).toHaveLength(8);
    expect(first?.increments?.[3]).toEqual({
      incrementNo: 4,
      appliedStressKpa: 100,
      voidRatioStart: 1.87,
      voidRatioEnd: 1.686,
      mvM2PerMn: 1.281,
      cvRootTimeM2PerYear: 1.16,
      cvLogTimeM2PerYear: 1.1,
      cAlpha: 0.032,
    });
    expect(rows.every((r) => r.problems === undefined)).toBe(true);
  });

  it('says which groups and headings it did not read', () => {
    const { notices } = read(fixture('invented-two-boreholes.ags'));
    expect(notices).toContain('Group ISPT is not read by Claybank; its 3 rows were skipped.');
    expect(notices).toContain('Group CONG: headings SPEC_DESC, CONG_SDIA are not read by Claybank.');
    expect(notices.join('\n')).not.toMatch(/TRAN|Group UNIT|FILE_FSET/);
  });

  it('gives rows that validate like CSV rows, increments included', () => {
    const { rows } = read(fixture('invented-two-boreholes.ags'));
    const result = validateRows(rows, VOCABULARY);
    expect(result.errors).toEqual([]);
    expect(result.valid.map((v) => [v.row, v.record.locationCell, v.increments.length, v.record.compressionIndex])).toEqual([
      [80, 'E82-N57', 8, null],
      [81, 'E82-N57', 8, null],
      [82, 'E83-N58', 8, null],
    ]);
  });

  it('reports unknown geology codes like an unknown unit in a CSV', () => {
    const { rows } = read(fixture('invented-two-boreholes.ags'), { region: 'Saltreach Estuary', geologyMap: {} });
    const result = validateRows(rows, VOCABULARY);
    expect(result.errors).toHaveLength(3);
    expect(result.errors[0]).toEqual({
      row: 80,
      field: 'geologicalUnit',
      message: expect.stringContaining('"SEC" is not one of the bank’s geological units'),
    });
  });

  it('honours the UNIT line', () => {
    const si = read(smallAgs()).rows[0];
    expect(si?.values.depthBottom).toBeCloseTo(4.02, 12);
    expect(si?.increments?.[0]).toMatchObject({ appliedStressKpa: 100, cvRootTimeM2PerYear: 2 });
    const other = read(smallAgs({ stressUnit: 'MPa', stress: '0.1', depthUnit: 'ft', top: '13.12', cvUnit: 'cm2/s' })).rows[0];
    expect(other?.increments?.[0]?.appliedStressKpa).toBeCloseTo(100, 9);
    expect(other?.increments?.[0]?.cvRootTimeM2PerYear).toBeCloseTo(2 * 3155.76, 9);
    expect(other?.values.depthTop).toBeCloseTo(13.12 * 0.3048, 12);
  });

  it('refuses a unit it cannot convert', () => {
    const result = readAgs4(smallAgs({ stressUnit: 'bar' }), OPTIONS);
    expect(result).toMatchObject({ ok: false, error: { code: 'AGS4_UNKNOWN_UNIT', issues: [{ line: 15 }] } });
    if (!result.ok) expect(result.error.message).toContain('CONS_INCF in "bar"');
  });

  it('reports a test whose depth no GEOL stratum covers', () => {
    const text = smallAgs().replace(q('DATA', 'BH1', '0.00', '20.00', 'SEC'), q('DATA', 'BH1', '0.00', '2.00', 'SEC'));
    const [row] = read(text).rows;
    expect(row?.problems).toEqual([
      { row: 11, field: 'geologicalUnit', message: expect.stringContaining('No GEOL stratum of BH1 covers 4.01 m') },
    ]);
  });

  it('notes CONS rows that match no CONG test', () => {
    const text = `${smallAgs()}\r\n${q('DATA', 'BH9', '1.00', '1', 'U', 'S1', '1', '', '1', '50', '1.2', '')}`;
    expect(read(text).notices).toContain('Group CONS: 1 row (line 18) match no CONG test and was skipped.');
  });

  it.each([
    [
      'DATA before HEADING',
      [q('GROUP', 'CONG'), q('DATA', 'BH1', '1.00'), q('HEADING', 'LOCA_ID', 'SAMP_TOP')],
      [{ line: 2, message: 'Line 2: DATA line in group CONG comes before its HEADING line.' }],
    ],
    [
      'a DATA line with the wrong number of fields',
      [q('GROUP', 'CONG'), q('HEADING', 'LOCA_ID', 'SAMP_TOP'), q('UNIT', '', 'm'), q('DATA', 'BH1', '1.00', 'extra')],
      [{ line: 4, message: 'Line 4: the DATA line has 3 fields but group CONG has 2 headings.' }],
    ],
    [
      'an unknown descriptor and an unclosed quote',
      [q('GROUP', 'CONG'), q('HEADING', 'LOCA_ID', 'SAMP_TOP'), q('DAT', 'BH1', '1.00'), '"DATA","BH1,"1.00"'],
      [
        { line: 3, message: expect.stringContaining('starts with "DAT"') },
        { line: 4, message: expect.stringContaining('text after a closing quote') },
      ],
    ],
    [
      'a group given twice',
      [q('GROUP', 'CONG'), q('HEADING', 'LOCA_ID', 'SAMP_TOP'), q('GROUP', 'CONG')],
      [{ line: 3, message: expect.stringContaining('given again (first at line 1)') }],
    ],
  ])('refuses a malformed file: %s, with line numbers', (_name, lines, issues) => {
    const result = readAgs4(lines.join('\r\n'), OPTIONS);
    expect(result).toMatchObject({ ok: false, error: { code: 'AGS4_MALFORMED', issues } });
    if (!result.ok) expect(result.error.message).toContain('The AGS4 file is not well formed');
  });

  it('refuses a CSV given as AGS4, a file without tests, and binary content', () => {
    expect(readAgs4(fixture('good.csv'), OPTIONS)).toMatchObject({ ok: false, error: { code: 'NOT_AGS4' } });
    expect(readAgs4([q('GROUP', 'PROJ'), q('HEADING', 'PROJ_ID'), q('DATA', 'P1')].join('\n'), OPTIONS)).toMatchObject({
      ok: false,
      error: { code: 'AGS4_NO_TESTS' },
    });
    expect(readAgs4(new Uint8Array([0x22, 0x47, 0x00, 0x00]), OPTIONS)).toMatchObject({
      ok: false,
      error: { code: 'BINARY_FILE' },
    });
    const noKey = [q('GROUP', 'CONG'), q('HEADING', 'SAMP_TOP', 'CONG_IVR'), q('DATA', '1.00', '1.2')].join('\n');
    expect(readAgs4(noKey, OPTIONS)).toMatchObject({
      ok: false,
      error: { code: 'AGS4_MALFORMED', message: expect.stringContaining('no LOCA_ID heading') },
    });
  });

  it('never throws on line soup', () => {
    const headings = [
      'LOCA_ID',
      'SAMP_TOP',
      'SAMP_REF',
      'SPEC_REF',
      'CONS_INCN',
      'CONS_INCF',
      'GEOL_TOP',
      'GEOL_BASE',
      'GEOL_GEOL',
      'CONG_IVR',
      '__proto__',
    ];
    const value = fc.oneof(
      fc.constantFrom('BH1', '1.5', '#2.6', 'NP', '', 'kPa', 'MPa', 'm', 'bar', 'constructor', '1e999'),
      fc.string({ maxLength: 6 }),
    );
    const line = fc.oneof(
      fc
        .constantFrom('CONG', 'CONS', 'GEOL', 'LOCA', 'SAMP', 'LLPL', 'ISPT', 'PROJ', '__proto__', 'toString', '')
        .map((g) => q('GROUP', g)),
      fc.shuffledSubarray(headings, { maxLength: 4 }).map((h) => q('HEADING', ...h)),
      fc.tuple(fc.constantFrom('UNIT', 'TYPE', 'DATA', 'DATA'), fc.array(value, { maxLength: 4 })).map(([d, v]) => q(d, ...v)),
      fc.array(value, { maxLength: 5 }).map((v) => v.join(',')),
      fc.string({ maxLength: 30 }),
      fc.constant(''),
    );
    fc.assert(
      fc.property(
        fc.boolean(),
        fc.array(line, { maxLength: 40 }),
        fc.constantFrom('\r\n', '\n', '\r'),
        (startWithGroup, lines, newline) => {
          const text = [...(startWithGroup ? [q('GROUP', 'CONG')] : []), ...lines].join(newline);
          const result = readAgs4(text, OPTIONS);
          if (result.ok) validateRows(result.rows, VOCABULARY);
          else expect(result.error.message.length).toBeGreaterThan(0);
        },
      ),
      { seed: 4041, numRuns: 1500 },
    );
  });

  it('never throws on well-formed files holding odd values and units', () => {
    const value = fc.oneof(
      fc.constantFrom('BH1', '1.5', '4.00', '#2.6', 'NP', '', '-3', '0', '1e999', '__proto__'),
      fc.string({ maxLength: 5 }),
    );
    const unit = fc.oneof(
      { arbitrary: fc.constant(''), weight: 30 },
      { arbitrary: fc.constantFrom('m', 'ft', 'mm', 'kPa', 'MPa', 'psf', 'm2/yr', 'cm2/s', 'Mg/m3', '%', 'bar'), weight: 1 },
    );
    const group = (name: string, headings: string[]) =>
      fc
        .tuple(
          fc.array(unit, { minLength: headings.length, maxLength: headings.length }),
          fc.array(fc.array(value, { minLength: headings.length, maxLength: headings.length }), { maxLength: 4 }),
        )
        .map(([units, rows]) =>
          [q('GROUP', name), q('HEADING', ...headings), q('UNIT', ...units), ...rows.map((r) => q('DATA', ...r))].join('\n'),
        );
    const key = ['LOCA_ID', 'SAMP_TOP', 'SAMP_REF', 'SAMP_TYPE', 'SAMP_ID', 'SPEC_REF', 'SPEC_DPTH'];
    const file = fc
      .tuple(
        group('CONG', [...key, 'CONG_TYPE', 'CONG_HIGT', 'CONG_IVR', 'CONG_BDEN', 'CONG_PDEN']),
        group('LOCA', ['LOCA_ID', 'LOCA_NATE', 'LOCA_NATN']),
        group('SAMP', ['LOCA_ID', 'SAMP_TOP', 'SAMP_REF', 'SAMP_TYPE', 'SAMP_ID', 'SAMP_BASE']),
        group('GEOL', ['LOCA_ID', 'GEOL_TOP', 'GEOL_BASE', 'GEOL_GEOL', 'GEOL_GEO2']),
        group('LLPL', [...key, 'LLPL_LL', 'LLPL_PL', 'LLPL_PI']),
        group('CONS', [...key, 'CONS_INCN', 'CONS_INCF', 'CONS_IVR', 'CONS_INCE', 'CONS_INMV', 'CONS_CVRT', 'CONS_INSC']),
      )
      .chain(([cong, ...others]) => fc.shuffledSubarray(others).map((picked) => [cong, ...picked]));
    let read = 0;
    fc.assert(
      fc.property(file, (groups) => {
        const result = readAgs4(groups.join('\r\n\r\n'), {
          region: 'Saltreach Estuary',
          geologyMap: { BH1: 'Saltreach Estuarine Clay' },
        });
        if (!result.ok) return;
        read++;
        const checked = validateRows(result.rows, VOCABULARY);
        expect(checked.valid.length + new Set(checked.errors.map((e) => e.row)).size).toBe(result.rows.length);
      }),
      { seed: 4042, numRuns: 1000 },
    );
    expect(read).toBeGreaterThan(100);
  });
});
