import { type Actor, hasPermission } from '../../lib/permissions/roles';

export interface NextStep {
  href: string;
  label: string;
  summary: string;
}

/**
 * Where a person goes from their start page, in order of what their role is for: the platform admin
 * runs the bank, a steward reviews, an estimator prices settlement, contributors upload, and only firm
 * owners and admins hear about members and API keys.
 */
export function nextStepsFor(actor: Actor): NextStep[] {
  const steps: NextStep[] = [];
  const can = hasPermission;
  if (can(actor, 'people', 'manage')) {
    steps.push({
      href: '/admin',
      label: 'Admin area',
      summary: 'Regions and units, people and firms, bank versions and the disclosure thresholds.',
    });
  }
  if (can(actor, 'submission', 'review')) {
    steps.push({
      href: '/review',
      label: 'Review',
      summary: 'Submissions waiting for a steward: check them against raw readings and the pool, then accept or return.',
    });
  }
  if (can(actor, 'vocabulary', 'manage') && !can(actor, 'people', 'manage')) {
    steps.push({
      href: '/admin/vocabulary',
      label: 'Regions and units',
      summary: 'Keep the vocabulary uploads are matched against clean: rename, merge, retire.',
    });
  }
  if (can(actor, 'audit', 'read-all')) {
    steps.push({ href: '/audit', label: 'Activity log', summary: 'Everything that happened, in plain words.' });
  }
  if (can(actor, 'estimate', 'create') && !can(actor, 'submission', 'create')) {
    steps.push({
      href: '/estimates',
      label: 'Estimates',
      summary: 'An early low / likely / high settlement and time to 90 % consolidation for a fill on a named deposit.',
    });
  }
  if (can(actor, 'bank', 'browse') || can(actor, 'bank', 'statistics')) {
    steps.push({
      href: '/bank',
      label: 'Bank',
      summary: 'What a deposit typically does, and how many tests and firms stand behind each figure.',
    });
  }
  if (can(actor, 'submission', 'create')) {
    steps.push({
      href: '/contribute',
      label: 'Contribute',
      summary: "Upload your firm's oedometer results from a spreadsheet or AGS4 file.",
    });
  }
  if (can(actor, 'estimate', 'create') && can(actor, 'submission', 'create')) {
    steps.push({
      href: '/estimates',
      label: 'Estimates',
      summary: 'Turn bank ranges into low / likely / high settlement and time to 90 % consolidation.',
    });
  }
  if (can(actor, 'firm', 'manage-api-keys')) {
    steps.push({
      href: '/firm',
      label: 'Firm settings',
      summary: "Invite colleagues, set their roles, and manage API keys for your firm's upload scripts.",
    });
  } else if (actor.firmId) {
    steps.push({ href: '/firm', label: 'Firm settings', summary: 'Who is in your firm and their roles.' });
  }
  return steps;
}
