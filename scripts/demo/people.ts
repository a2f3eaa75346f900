import type { FirmRole, PlatformRole } from '../../src/lib/permissions/roles';

/** The invented firms and people of the Saltreach demo scenario. None of them exists. */
export const DEMO_PASSWORD = 'saltreach-demo-2026';

export interface DemoFirm {
  slug: string;
  name: string;
  /** share of the demo bank's test records this firm contributes */
  share: number;
}

export const DEMO_FIRMS: DemoFirm[] = [
  { slug: 'quillfen', name: 'Quillfen Ground Partners', share: 0.55 },
  { slug: 'ellery-voss', name: 'Ellery & Voss Geotechnical', share: 0.3 },
  { slug: 'northmarch', name: 'Northmarch Soil Labs', share: 0.15 },
];

export interface DemoPerson {
  name: string;
  email: string;
  platformRole: PlatformRole;
  memberships: { firm: string; role: FirmRole }[];
  /** how start-up lists the person */
  label: string;
}

export const DEMO_PEOPLE: DemoPerson[] = [
  { name: 'Rowan Pike', email: 'admin@example.test', platformRole: 'admin', memberships: [], label: 'platform admin' },
  { name: 'Maren Tolliver', email: 'steward@example.test', platformRole: 'steward', memberships: [], label: 'data steward' },
  {
    name: 'Isla Quillfen',
    email: 'owner@quillfen.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'quillfen', role: 'owner' }],
    label: 'firm owner (Quillfen)',
  },
  {
    name: 'Tobias Reed',
    email: 'engineer@quillfen.example.test',
    platformRole: 'user',
    memberships: [
      { firm: 'quillfen', role: 'engineer' },
      { firm: 'northmarch', role: 'contributor' },
    ],
    label: 'engineer (Quillfen; also Northmarch)',
  },
  {
    name: 'Priya Vance',
    email: 'estimator@quillfen.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'quillfen', role: 'estimator' }],
    label: 'estimator (Quillfen)',
  },
  {
    name: 'Jonah Marsh',
    email: 'contributor@quillfen.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'quillfen', role: 'contributor' }],
    label: 'contributor (Quillfen)',
  },
  {
    name: 'Celia Voss',
    email: 'owner@ellery-voss.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'ellery-voss', role: 'owner' }],
    label: 'firm owner (Ellery & Voss)',
  },
  {
    name: 'Dev Anand',
    email: 'admin@ellery-voss.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'ellery-voss', role: 'admin' }],
    label: 'firm admin (Ellery & Voss)',
  },
  {
    name: 'Hana Brook',
    email: 'engineer@ellery-voss.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'ellery-voss', role: 'engineer' }],
    label: 'engineer (Ellery & Voss)',
  },
  {
    name: 'Oskar Lind',
    email: 'estimator@ellery-voss.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'ellery-voss', role: 'estimator' }],
    label: 'estimator (Ellery & Voss)',
  },
  {
    name: 'Ruth Okafor',
    email: 'contributor@ellery-voss.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'ellery-voss', role: 'contributor' }],
    label: 'contributor (Ellery & Voss)',
  },
  {
    name: 'Ewan Northcott',
    email: 'owner@northmarch.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'northmarch', role: 'owner' }],
    label: 'firm owner (Northmarch)',
  },
  {
    name: 'Lena Fisk',
    email: 'contributor@northmarch.example.test',
    platformRole: 'user',
    memberships: [{ firm: 'northmarch', role: 'contributor' }],
    label: 'contributor (Northmarch)',
  },
];
