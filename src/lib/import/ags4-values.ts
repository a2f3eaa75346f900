import type { Ags4Group, Ags4Record } from './ags4-parse';
import { type AgsQuantity, agsFactor, HEADING_QUANTITY } from './ags4-units';

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Reads the values of one AGS4 record, converting numbers by the group's UNIT line; bad numbers are collected. */
export class AgsValues {
  readonly problems: { heading: string; message: string }[] = [];
  constructor(
    private readonly group: Ags4Group,
    private readonly factors: ReadonlyMap<string, number>,
    readonly record: Ags4Record,
  ) {}

  text(heading: string): string | null {
    const v = Object.hasOwn(this.record.values, heading) ? (this.record.values[heading]?.trim() ?? '') : '';
    return v === '' ? null : v;
  }

  /** A number in the bank's unit; "#" (an assumed value) is dropped, "NP" (non-plastic) reads as blank. */
  number(heading: string): number | null {
    let v = this.text(heading);
    if (v === null) return null;
    if (v.startsWith('#')) v = v.slice(1).trim();
    if (v === '' || v.toUpperCase() === 'NP') return null;
    if (!PLAIN.test(v)) {
      this.problems.push({
        heading,
        message: `${this.group.name} ${heading} "${v}" on line ${this.record.line} is not a number.`,
      });
      return null;
    }
    return Number(v) * (this.factors.get(heading) ?? 1);
  }
}

/** The unit factor of every heading the importer converts, or the first heading whose unit it cannot convert. */
export function groupFactors(group: Ags4Group): { factors: Map<string, number> } | { heading: string; unit: string } {
  const factors = new Map<string, number>();
  for (const heading of group.headings) {
    if (!Object.hasOwn(HEADING_QUANTITY, heading)) continue;
    const quantity = HEADING_QUANTITY[heading] as AgsQuantity;
    const unit = Object.hasOwn(group.units, heading) ? (group.units[heading] ?? '') : '';
    const factor = agsFactor(quantity, unit);
    if (factor === null) return { heading, unit };
    factors.set(heading, factor);
  }
  return { factors };
}

/** A key part as text, numbers written the same way whatever their trailing zeros ("5.00" → "5"). */
export function keyPart(value: string | undefined): string {
  const v = (value ?? '').trim();
  return PLAIN.test(v) ? String(Number(v)) : v;
}

/** The AGS4 sample key: LOCA_ID, SAMP_TOP, SAMP_REF, SAMP_TYPE, SAMP_ID. */
export function sampleKey(values: Readonly<Record<string, string>>): string {
  return ['LOCA_ID', 'SAMP_TOP', 'SAMP_REF', 'SAMP_TYPE', 'SAMP_ID']
    .map((h) => keyPart(Object.hasOwn(values, h) ? values[h] : ''))
    .join('\u0001');
}

/** The AGS4 specimen key: the sample key with SPEC_REF and SPEC_DPTH (the key of CONG and, with CONS_INCN, of CONS). */
export function specimenKey(values: Readonly<Record<string, string>>): string {
  const part = (h: string) => keyPart(Object.hasOwn(values, h) ? values[h] : '');
  return [sampleKey(values), part('SPEC_REF'), part('SPEC_DPTH')].join('\u0001');
}
