import { requirePermission } from '../../../../lib/server/http/guards';
import { handleApi, json } from '../../../../lib/server/http/respond';
import { readBankSettings } from '../../../../lib/server/settings/settings-service';

export const prerender = false;

/** Bank-wide settings with their defaults (platform admin). */
export const GET = handleApi(async (context, app) => {
  await requirePermission(context, 'settings', 'manage');
  return json(await readBankSettings(app));
});
