import { recordCorrectionSchema } from '../../../../../lib/contracts/submissions';
import { editReturnedRecord } from '../../../../../lib/server/contribute/edit-record';
import { contributorOf } from '../../../../../lib/server/http/acting';
import { requirePermission } from '../../../../../lib/server/http/guards';
import { readParams, uuidParam } from '../../../../../lib/server/http/params';
import { BODY_LIMIT_BYTES } from '../../../../../lib/server/http/read-body';
import { handleApi, json, readJsonBody } from '../../../../../lib/server/http/respond';

export const prerender = false;

/** Corrects a record of a returned submission (values in SI units, checked like an upload row). */
export const PATCH = handleApi(async (context, app) => {
  const identity = await requirePermission(context, 'submission', 'create');
  const { id, recordId } = readParams(context, { id: uuidParam, recordId: uuidParam });
  const body = await readJsonBody(context.request, recordCorrectionSchema, BODY_LIMIT_BYTES.recordCorrection);
  return json(await editReturnedRecord(app, contributorOf(context, identity), id, recordId, body.values));
});
