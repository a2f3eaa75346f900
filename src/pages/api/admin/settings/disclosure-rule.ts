import { disclosureRuleSchema } from '../../../../lib/contracts/settings';
import { actingPerson } from '../../../../lib/server/http/acting';
import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json, readJsonBody } from '../../../../lib/server/http/respond';
import { updateDisclosureRule } from '../../../../lib/server/settings/settings-service';

export const prerender = false;

/** Replaces the disclosure rule: `{ minTests, minFirms, maxFirmSharePct }` (platform admin). */
export const PUT = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'settings', 'manage');
  const body = await readJsonBody(context.request, disclosureRuleSchema);
  return json(await updateDisclosureRule(app, actingPerson(context, identity), body));
});
