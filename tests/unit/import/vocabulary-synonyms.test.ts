import { describe, expect, it } from 'vitest';
import type { RawRow } from '../../../src/lib/import/raw-row';
import { validateRows } from '../../../src/lib/import/validate-rows';
import { VocabularyIndex } from '../../../src/lib/import/vocabulary-match';

const units = [
  { id: 'unit-sec', name: 'Saltreach Estuarine Clay', slug: 'saltreach-estuarine-clay', synonyms: ['Saltreach Marine Clay'] },
  { id: 'unit-vp', name: 'Vennmoor Peat', slug: 'vennmoor-peat', synonyms: ['Fen Peat', 'Vennmoor Moss Peat'] },
  { id: 'unit-old', name: 'Tamsel Alluvial Silt', slug: 'tamsel-alluvial-silt', retired: true },
];
const regions = [{ id: 'region-se', name: 'Saltreach Estuary', slug: 'saltreach-estuary' }];

const row = (geologicalUnit: string): RawRow => ({
  row: 2,
  values: {
    boreholeId: 'BH1',
    region: 'Saltreach Estuary',
    geologicalUnit,
    depthTop: 3,
    depthBottom: 3.45,
    compressionIndex: 0.9,
  },
});

describe('vocabulary synonyms and retired entries', () => {
  it('matches a synonym whatever its case and spacing, to the entry that carries it', () => {
    const index = new VocabularyIndex(units);
    expect(index.find('saltreach  MARINE clay')?.id).toBe('unit-sec');
    expect(index.find('Vennmoor-Moss-Peat')?.id).toBe('unit-vp');
    expect(index.find('Orrin Clay')).toBeNull();
  });

  it("lets an entry's own name win over another entry's synonym", () => {
    const index = new VocabularyIndex([
      { id: 'a', name: 'Fen Peat', slug: 'fen-peat' },
      { id: 'b', name: 'Vennmoor Peat', slug: 'vennmoor-peat', synonyms: ['Fen Peat'] },
    ]);
    expect(index.find('Fen Peat')?.id).toBe('a');
  });

  it('stores a row that names a unit by an earlier name under the unit as it is called now', () => {
    const { valid, errors } = validateRows([row('Saltreach Marine Clay')], { regions, units, existingKeys: new Set() });
    expect(errors).toEqual([]);
    expect(valid[0]?.record.geologicalUnitId).toBe('unit-sec');
  });

  it('refuses a row naming a retired unit, saying it takes no new uploads, and never suggests it', () => {
    const retired = validateRows([row('Tamsel Alluvial Silt')], { regions, units, existingKeys: new Set() });
    expect(retired.valid).toEqual([]);
    expect(retired.errors.map((e) => e.message).join(' ')).toMatch(/retired and takes no new uploads/);
    expect(retired.errors.map((e) => e.field)).toEqual(['geologicalUnit']);
    const misspelt = validateRows([row('Tamsel Aluvial Silt')], { regions, units, existingKeys: new Set() });
    const message = misspelt.errors.map((e) => e.message).join(' ');
    expect(message).toContain('is not one of the bank’s geological units');
    expect(message).not.toContain('Tamsel Alluvial Silt"');
  });
});
