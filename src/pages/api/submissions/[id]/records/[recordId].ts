import { recordCorrectionSchema } from '../../../../../lib/schemas/record-correction';
import { appContext } from '../../../../../lib/server/app-context';
import { editReturnedRecord } from '../../../../../lib/server/contribute/edit-record';
import { activeFirmId, requirePermission } from '../../../../../lib/server/http/guards';
import { BODY_LIMIT_BYTES } from '../../../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../../../lib/server/http/respond';

export const prerender = false;

/** Corrects a record of a returned submission (values in SI units, checked like an upload row). */
export const PATCH = handleApi(async (context) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const body = await readJsonBody(context.request, recordCorrectionSchema, BODY_LIMIT_BYTES.recordCorrection);
  const contributor = {
    userId: identity.user.id,
    firmId: activeFirmId(identity),
    ipAddress: context.clientAddress,
    via: 'browser' as const,
  };
  const record = await editReturnedRecord(
    appContext().database.db,
    contributor,
    context.params.id ?? '',
    context.params.recordId ?? '',
    body.values,
  );
  return json({ record });
});
