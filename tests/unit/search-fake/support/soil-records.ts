// Invented soil test records for the contract tests (not real data): enough variety to exercise
// every filter operator — strings in several spellings, numbers, arrays, nulls, empty values and
// missing fields.
export interface SoilRecord {
  id: number;
  unit?: string | null;
  description?: string;
  uscs?: string;
  depth_m?: number | null;
  cc?: number | string;
  tags?: string[];
  note?: string | null | Record<string, never>;
}

export const SOIL_RECORDS: SoilRecord[] = [
  {
    id: 1,
    unit: 'Saltreach Clay',
    description: 'soft grey estuarine clay with shells',
    uscs: 'CH',
    depth_m: 4.5,
    cc: 0.62,
    tags: ['organic', 'shells'],
    note: 'good sample',
  },
  {
    id: 2,
    unit: 'saltreach clay',
    description: 'firm brown clay',
    uscs: 'CL',
    depth_m: 9,
    cc: 0.31,
    tags: ['fissured'],
    note: null,
  },
  {
    id: 3,
    unit: 'Marsh Peat',
    description: 'fibrous péat, very compressible',
    uscs: 'PT',
    depth_m: 1.2,
    cc: 2.4,
    tags: [],
    note: '',
  },
  { id: 4, unit: 'River Sand', description: 'loose sand with silt', uscs: 'SM', depth_m: 12.5, tags: ['loose'], note: {} },
  {
    id: 5,
    unit: 'Saltreach Clay',
    description: 'stiff overconsolidated clay',
    uscs: 'CH',
    depth_m: 15,
    cc: 0.28,
    tags: ['organic', 'fissured'],
  },
  { id: 6, unit: null, description: 'made ground, brick and clay fill', uscs: 'GC', depth_m: null, cc: 'n/a' },
  {
    id: 7,
    unit: 'Estuarine Silt',
    description: 'soft clayey silt with organic traces',
    uscs: 'ML',
    depth_m: 6.25,
    cc: 0.45,
    tags: ['organic'],
  },
  { id: 8, unit: 'Glacial Till', description: 'consolidation test on stiff till', uscs: 'CL', cc: 0.12 },
];

export const ALL_IDS = SOIL_RECORDS.map((r) => r.id);
