/** The product's areas, in header order. */
export const AREAS = [
  { href: '/bank', label: 'Bank', summary: 'Search published test records and read pooled statistics by deposit and depth.' },
  {
    href: '/contribute',
    label: 'Contribute',
    summary: "Upload your firm's oedometer results from a spreadsheet, AGS4 file or by API key.",
  },
  {
    href: '/review',
    label: 'Review',
    summary: 'Data stewards check submissions against raw readings and the pool, then accept or return them.',
  },
  {
    href: '/estimates',
    label: 'Estimates',
    summary: 'Turn bank ranges into low / likely / high settlement and time to 90 % consolidation.',
  },
  { href: '/firm', label: 'Firm settings', summary: 'Members, roles and API keys of your firm.' },
] as const;

export type AreaHref = (typeof AREAS)[number]['href'];

/** True when the path is the area's page or one below it. */
export function isCurrentArea(pathname: string, href: string): boolean {
  return pathname === href || pathname.startsWith(`${href}/`);
}
