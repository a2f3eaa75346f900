import { geologyAt, geologyLayers } from './ags4-geology';
import { incrementsBySpecimen } from './ags4-increments';
import type { Ags4Group, Ags4Record } from './ags4-parse';
import { STANDARD_GRAVITY, WATER_DENSITY_MG_PER_M3 } from './ags4-units';
import { type AgsValues, sampleKey, specimenKey } from './ags4-values';
import type { RowError } from './errors';
import type { ImportFieldKey } from './fields';
import type { RawRow, RawValue } from './raw-row';
import { formatValue } from './row-ranges';
import { canonicalTestMethod } from './test-method';

/** AGS4 sample type codes spelt out for the shared sampling method (common practice codes); others pass through. */
const SAMPLE_TYPES: Readonly<Record<string, string>> = {
  U: 'open-tube (U)',
  UT: 'thin-wall open-tube (UT)',
  TW: 'thin-wall tube (TW)',
  P: 'piston (P)',
  PS: 'piston (PS)',
  BLK: 'block (BLK)',
  CBS: 'core (CBS)',
};

export interface Ags4RowOptions {
  region: string;
  /** geology code (GEOL_GEOL or GEOL_GEO2) → the bank's geological unit name */
  geologyMap?: Readonly<Record<string, string>>;
}

type Reader = (group: string, record: Ags4Record) => AgsValues;

/**
 * Builds one raw row per CONG record, joining LOCA (coordinates), SAMP (sample base and type), GEOL
 * (the stratum at the specimen depth), the index groups LLPL, LNMC, LDEN, LPDN (by specimen, else by
 * sample), PROJ (project and client, kept private) and CONS (the increments). Values measured on the
 * consolidation specimen itself (CONG_MCI, CONG_BDEN, CONG_PDEN) are preferred to the sample's index
 * tests. Summary values (Cc, σ'p, cv) are not worked out from the increments here: the increments are
 * carried as they are and interpretation is a later step.
 */
export function buildAgs4Rows(
  groups: ReadonlyMap<string, Ags4Group>,
  read: Reader,
  options: Ags4RowOptions,
): { rows: RawRow[]; notices: string[]; geologyCodes: string[] } {
  const notices: string[] = [];
  const all = (name: string) => (groups.get(name)?.rows ?? []).map((r) => read(name, r));
  const project = all('PROJ')[0];
  const locations = new Map(all('LOCA').map((v) => [v.text('LOCA_ID') ?? '', v]));
  const samples = new Map(all('SAMP').map((v) => [sampleKey(v.record.values), v]));
  const layers = geologyLayers(all('GEOL'));
  const index = (name: string) => {
    const bySpecimen = new Map<string, AgsValues>();
    const bySample = new Map<string, AgsValues>();
    for (const v of all(name)) {
      if (!bySpecimen.has(specimenKey(v.record.values))) bySpecimen.set(specimenKey(v.record.values), v);
      if (!bySample.has(sampleKey(v.record.values))) bySample.set(sampleKey(v.record.values), v);
    }
    return (values: Readonly<Record<string, string>>) => bySpecimen.get(specimenKey(values)) ?? bySample.get(sampleKey(values));
  };
  const llpl = index('LLPL');
  const lnmc = index('LNMC');
  const lden = index('LDEN');
  const lpdn = index('LPDN');
  const increments = incrementsBySpecimen(all('CONS'), groups.get('CONG')?.rows ?? [], notices);
  const codes = new Set<string>();
  for (const layer of layers.values()) for (const l of layer) for (const c of l.codes) codes.add(c);

  const rows: RawRow[] = [];
  for (const cong of all('CONG')) {
    const key = cong.record.values;
    const sample = samples.get(sampleKey(key));
    const location = locations.get(cong.text('LOCA_ID') ?? '');
    const top = cong.number('SAMP_TOP') ?? cong.number('SPEC_DPTH');
    const height = cong.number('CONG_HIGT');
    const sampleBase = sample?.number('SAMP_BASE') ?? null;
    const bottom =
      sampleBase !== null && top !== null && sampleBase > top
        ? sampleBase
        : top !== null && height !== null
          ? top + height
          : sampleBase;
    const specimenDepth = cong.number('SPEC_DPTH') ?? (top !== null && bottom !== null ? (top + bottom) / 2 : top);
    const problems: RowError[] = [];
    const geology = geologyAt(layers.get(cong.text('LOCA_ID') ?? '') ?? [], specimenDepth, options.geologyMap);
    if (geology === null && specimenDepth !== null) {
      problems.push({
        row: cong.record.line,
        field: 'geologicalUnit',
        message: `No GEOL stratum of ${cong.text('LOCA_ID')} covers ${formatValue(specimenDepth)} m, so the geological unit is unknown. Add the stratum to the GEOL group.`,
      });
    }
    const typeText = cong.text('CONG_TYPE');
    const method = typeText === null ? null : canonicalTestMethod(typeText);
    if (typeText !== null && method === null) {
      notices.push(
        `CONG line ${cong.record.line}: test type "${typeText}" is not one Claybank knows; the test method is left blank.`,
      );
    }
    const sampleType = cong.text('SAMP_TYPE');
    const sampleId = [cong.text('SAMP_ID') ?? cong.text('SAMP_REF'), cong.text('SPEC_REF')].filter((p) => p !== null).join(' / ');
    const density = cong.number('CONG_BDEN') ?? lden(key)?.number('LDEN_BDEN') ?? null;
    const particleDensity = cong.number('CONG_PDEN') ?? lpdn(key)?.number('LPDN_PDEN') ?? null;
    const values: Partial<Record<ImportFieldKey, RawValue>> = {
      projectName: project?.text('PROJ_NAME') ?? null,
      clientName: project?.text('PROJ_CLNT') ?? null,
      boreholeId: cong.text('LOCA_ID'),
      sampleId: sampleId === '' ? null : sampleId,
      easting: location?.number('LOCA_NATE') ?? null,
      northing: location?.number('LOCA_NATN') ?? null,
      coordinateSystem: location?.text('LOCA_GREF') ?? null,
      notes: cong.text('CONG_REM'),
      region: options.region,
      geologicalUnit: geology,
      depthTop: top,
      depthBottom: bottom,
      samplingMethod: sampleType === null ? null : (SAMPLE_TYPES[sampleType.toUpperCase()] ?? sampleType),
      waterContentPct: cong.number('CONG_MCI') ?? lnmc(key)?.number('LNMC_MC') ?? null,
      liquidLimitPct: llpl(key)?.number('LLPL_LL') ?? null,
      plasticLimitPct: llpl(key)?.number('LLPL_PL') ?? null,
      plasticityIndexPct: llpl(key)?.number('LLPL_PI') ?? null,
      specificGravity: particleDensity === null ? null : particleDensity / WATER_DENSITY_MG_PER_M3,
      bulkUnitWeight: density === null ? null : density * STANDARD_GRAVITY,
      initialVoidRatio: cong.number('CONG_IVR'),
      testMethod: method,
      testStandard: cong.text('CONG_METH'),
    };
    const own = increments.get(specimenKey(key)) ?? [];
    for (const source of [cong, sample, location, llpl(key), lnmc(key), lden(key), lpdn(key), ...own.map((i) => i.values)]) {
      for (const p of source?.problems ?? []) problems.push({ row: cong.record.line, field: null, message: p.message });
    }
    rows.push({
      row: cong.record.line,
      values,
      increments: own.map((i) => i.increment),
      ...(problems.length > 0 ? { problems: dedupe(problems) } : {}),
    });
  }
  return { rows, notices, geologyCodes: [...codes].sort() };
}

function dedupe(problems: RowError[]): RowError[] {
  const seen = new Set<string>();
  return problems.filter((p) => {
    const key = `${p.field}|${p.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
