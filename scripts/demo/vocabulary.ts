/** Invented regions and geological units of the Saltreach demo scenario. */
export const DEMO_REGIONS = [
  {
    slug: 'saltreach-estuary',
    name: 'Saltreach Estuary',
    description: 'Tidal flats and reclaimed land along a broad estuary; soft clay 5–25 m thick over dense sand. (Invented.)',
  },
  {
    slug: 'vennmoor-flats',
    name: 'Vennmoor Flats',
    description: 'Low-lying fen behind the estuary; peat 1–6 m over soft organic clay. (Invented.)',
  },
  {
    slug: 'orrin-uplands',
    name: 'Orrin Uplands',
    description: 'Gently rolling ground; stiff glacial lake clay under a thin silt cover. (Invented.)',
  },
  {
    slug: 'tamsel-valley',
    name: 'Tamsel Valley',
    description: 'River floodplain; interbedded silts and clayey silts with sand lenses. (Invented.)',
  },
] as const;

export const DEMO_UNITS = [
  {
    slug: 'saltreach-estuarine-clay',
    name: 'Saltreach Estuarine Clay',
    genesis: 'estuarine',
    age: 'Holocene',
    region: 'saltreach-estuary',
    description: 'Soft marine-estuarine clay, mostly CH with some CL; desiccated crust above about 3 m. (Invented.)',
  },
  {
    slug: 'vennmoor-peat',
    name: 'Vennmoor Peat',
    genesis: 'organic',
    age: 'Holocene',
    region: 'vennmoor-flats',
    description: 'Fibrous to amorphous fen peat (Pt), very compressible. (Invented.)',
  },
  {
    slug: 'vennmoor-organic-clay',
    name: 'Vennmoor Organic Clay',
    genesis: 'lacustrine',
    age: 'Holocene',
    region: 'vennmoor-flats',
    description: 'Soft lacustrine-organic clay (OH) below the peat. (Invented.)',
  },
  {
    slug: 'orrin-glaciolacustrine-clay',
    name: 'Orrin Glaciolacustrine Clay',
    genesis: 'glacial',
    age: 'Pleistocene',
    region: 'orrin-uplands',
    description: 'Stiff, overconsolidated glacial lake clay (CL, CH). (Invented.)',
  },
  {
    slug: 'tamsel-alluvial-silt',
    name: 'Tamsel Alluvial Silt',
    genesis: 'alluvial',
    age: 'Holocene',
    region: 'tamsel-valley',
    description: 'Fluvial silts and clayey silts (ML, CL-ML) with sand lenses. (Invented.)',
  },
] as const;
