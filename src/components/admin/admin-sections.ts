import type { Action, Actor, Resource } from '../../lib/permissions/roles';
import { hasPermission } from '../../lib/permissions/roles';

/** The admin area's pages, each with the grant it needs. */
export const ADMIN_SECTIONS = [
  {
    href: '/admin/vocabulary',
    label: 'Regions and units',
    summary: 'Add, rename, describe, merge and retire regions and geological units.',
    grant: ['vocabulary', 'manage'],
  },
  {
    href: '/admin/people',
    label: 'People',
    summary: 'Find a person, see their firms and roles, suspend an account or lift a suspension.',
    grant: ['people', 'manage'],
  },
  {
    href: '/admin/firms',
    label: 'Firms',
    summary: 'Find a firm, see its members and pass its ownership to another member.',
    grant: ['people', 'manage'],
  },
  {
    href: '/admin/versions',
    label: 'Bank versions',
    summary: 'Every published version of the bank: when, by whom, how many records, and why.',
    grant: ['bank', 'versions'],
  },
  {
    href: '/admin/settings',
    label: 'Settings',
    summary: 'When pooled figures may be shown: the disclosure thresholds.',
    grant: ['settings', 'manage'],
  },
  {
    href: '/audit',
    label: 'Activity log',
    summary: 'What happened in Claybank, in plain words, filtered by person, kind and date.',
    grant: ['audit', 'read-all'],
  },
] as const satisfies readonly { href: string; label: string; summary: string; grant: readonly [Resource, string] }[];

export type AdminSection = (typeof ADMIN_SECTIONS)[number];

/** The sections a person may open. */
export function sectionsFor(actor: Actor | null): AdminSection[] {
  return ADMIN_SECTIONS.filter((section) =>
    hasPermission(actor, section.grant[0] as Resource, section.grant[1] as Action<Resource>),
  );
}
