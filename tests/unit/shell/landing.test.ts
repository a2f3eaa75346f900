import { describe, expect, it } from 'vitest';
import { nextStepsFor } from '../../../src/components/shell/landing';
import type { Actor, FirmRole, PlatformRole } from '../../../src/lib/permissions/roles';

const actor = (platformRole: PlatformRole, firmRole: FirmRole | null = null): Actor => ({
  userId: 'u',
  platformRole,
  firmId: firmRole ? 'f' : null,
  firmRole,
});
const hrefs = (a: Actor) => nextStepsFor(a).map((step) => step.href);
const text = (a: Actor) =>
  nextStepsFor(a)
    .map((step) => step.summary)
    .join(' ');

// What each role is for, from the product's roles table: each landing leads with that work.
describe('the next steps on a person’s start page', () => {
  it.each([
    ['platform admin, no firm', actor('admin'), '/admin'],
    ['data steward', actor('steward'), '/review'],
    ['estimator', actor('user', 'estimator'), '/estimates'],
    ['contributor', actor('user', 'contributor'), '/bank'],
    ['firm owner', actor('user', 'owner'), '/bank'],
  ])('%s starts at %s', (_label, who, first) => {
    expect(hrefs(who)[0]).toBe(first);
  });

  it('never points the admin or the steward at starting a firm or contributing', () => {
    for (const who of [actor('admin'), actor('steward')]) {
      expect(hrefs(who)).not.toContain('/firm/new');
      expect(hrefs(who)).not.toContain('/contribute');
    }
  });

  it('points the estimator at Estimates and not at Contribute', () => {
    expect(hrefs(actor('user', 'estimator'))).toContain('/estimates');
    expect(hrefs(actor('user', 'estimator'))).not.toContain('/contribute');
  });

  it('tells only firm owners and admins about API keys', () => {
    expect(text(actor('user', 'owner'))).toContain('API keys');
    expect(text(actor('user', 'admin'))).toContain('API keys');
    for (const role of ['engineer', 'estimator', 'contributor'] as const)
      expect(text(actor('user', role))).not.toContain('API keys');
  });
});
