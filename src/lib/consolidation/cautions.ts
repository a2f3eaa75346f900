/** The standing cautions every estimate carries (product design, "Cautions"). */
export const STANDING_CAUTIONS: readonly string[] = [
  'Preliminary assessment only: use these figures for feasibility, bids and early design, not for final design.',
  'Parameter ranges come from pooled data of varying quality contributed by several firms.',
  'No substitute for site-specific investigation and laboratory testing of the actual deposit.',
  'Design must follow local codes and be checked by a licensed engineer.',
];
