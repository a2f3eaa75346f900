import { z } from 'zod';
import { saveEstimateSchema } from '../../schemas/estimate';
import { estimatePreviewSchema } from '../../schemas/estimate-preview';
import { pageQuerySchema } from '../../schemas/paging';
import { partnerJsonUploadSchema } from '../../schemas/partner-upload';
import { recordCorrectionSchema } from '../../schemas/record-correction';
import { reviewDecisionSchema } from '../../schemas/review';
import { uploadOptionsSchema } from '../../schemas/upload-options';
import { uuidParam } from '../http/params';
import type { DocumentedRoute } from './documented-route';

const json = <T>(schema: T) => [{ schema: schema as never }];
const uploadRoles = 'firm owner, admin, engineer or contributor (and a platform admin in their own firm)';
const estimateRoles = 'firm owner, admin, engineer or estimator';

/** A multipart upload: the file, and the reading choices as JSON text in `options` (schema UploadOptions). */
export const multipartUpload = z.object({
  file: z.string().meta({ format: 'binary', description: 'The CSV or AGS4 file.' }),
  options: uploadOptionsSchema.optional().meta({
    id: 'UploadOptions',
    description: 'How to read the file, sent as JSON text in this form field.',
  }),
});

/**
 * The partner JSON body as the endpoint parses it; `rows` is read as anything first (to name stray keys),
 * then piped into the list it must be, which is the part worth describing.
 */
const partnerJsonBody = partnerJsonUploadSchema.extend({
  rows: partnerJsonUploadSchema.shape.rows.out.meta({
    description:
      'One object per test, keyed by the template’s field keys (boreholeId, depthTop, compressionIndex …), values in SI units.',
  }),
});

/** A correction as the endpoint parses it, its `values` described by the object they are piped into. */
const correctionBody = recordCorrectionSchema.extend({
  values: recordCorrectionSchema.shape.values.out.meta({
    description: 'The fields to change, keyed by the template’s field keys, values in SI units (null clears one).',
  }),
});

/** A partner script's CSV body: the template's columns, one test per row. */
export const csvBody = z
  .string()
  .meta({ description: 'CSV text with the template’s header line (GET /api/contribute/template).' });

const partnerQuery = z.strictObject({
  delimiter: z
    .enum(['comma', 'semicolon', 'tab'])
    .optional()
    .meta({ description: 'CSV only; read from the header line when left out.' }),
  region: z.string().optional().meta({ description: 'CSV only: the region of every row when the file has no region column.' }),
  fileName: z.string().optional().meta({ description: 'CSV only: the name the submission shows.' }),
});

/** Uploads, test records, review and estimates. */
export const BANK_ROUTES: DocumentedRoute[] = [
  {
    method: 'get',
    path: '/api/partner/whoami',
    tag: 'Partner uploads',
    caller: 'apiKey',
    who: 'a firm API key',
    summary: 'Which firm the key belongs to and what it may do.',
    success: { status: 200, description: '{ firm, key, may }' },
  },
  {
    method: 'post',
    path: '/api/partner/submissions',
    tag: 'Partner uploads',
    caller: 'apiKey',
    who: 'a firm API key',
    summary:
      'Upload test records from a script: a CSV body (Content-Type: text/csv) or JSON rows keyed by field, in SI units. Stored whole or not at all.',
    query: partnerQuery,
    body: [
      { schema: partnerJsonBody, mediaType: 'application/json' },
      { schema: csvBody, mediaType: 'text/csv' },
    ],
    success: { status: 201, description: '{ submission }; 422 with one issue per row and field when any row is wrong.' },
  },
  {
    method: 'get',
    path: '/api/contribute/template',
    tag: 'Submissions',
    caller: 'anyone',
    who: 'anyone',
    summary: 'The CSV template with one row of invented example data.',
    success: { status: 200, description: 'text/csv' },
  },
  {
    method: 'get',
    path: '/api/firm/field-mapping',
    tag: 'Submissions',
    caller: 'session',
    who: uploadRoles,
    summary: "The firm's remembered column choices.",
    success: { status: 200, description: 'The mapping.' },
  },
  {
    method: 'get',
    path: '/api/submissions',
    tag: 'Submissions',
    caller: 'session',
    who: `${uploadRoles}; data stewards`,
    summary: "The firm's submissions (stewards: every submission past draft).",
    success: { status: 200, description: 'The submissions.' },
  },
  {
    method: 'post',
    path: '/api/submissions/check',
    tag: 'Submissions',
    caller: 'session',
    who: uploadRoles,
    summary: 'A dry run of an upload: row problems, flags and what others will see. Stores nothing.',
    body: [{ schema: multipartUpload, mediaType: 'multipart/form-data' }],
    success: { status: 200, description: 'The check.' },
  },
  {
    method: 'post',
    path: '/api/submissions',
    tag: 'Submissions',
    caller: 'session',
    who: uploadRoles,
    summary: 'Upload a file for the active firm, stored whole or not at all.',
    body: [{ schema: multipartUpload, mediaType: 'multipart/form-data' }],
    success: { status: 201, description: '{ submission }' },
  },
  {
    method: 'get',
    path: '/api/submissions/{id}',
    tag: 'Submissions',
    caller: 'session',
    who: 'the firm’s upload roles',
    summary: 'One submission with every record in full and the steward’s comments.',
    params: { id: uuidParam },
    success: { status: 200, description: 'The submission.' },
  },
  {
    method: 'patch',
    path: '/api/submissions/{id}/records/{recordId}',
    tag: 'Submissions',
    caller: 'session',
    who: uploadRoles,
    summary: 'Correct a record of a returned submission (SI units, checked like an upload row).',
    params: { id: uuidParam, recordId: uuidParam },
    body: json(correctionBody),
    success: { status: 200, description: 'The corrected record.' },
  },
  {
    method: 'post',
    path: '/api/submissions/{id}/resubmit',
    tag: 'Submissions',
    caller: 'session',
    who: uploadRoles,
    summary: 'Send a returned submission back for review.',
    params: { id: uuidParam },
    success: { status: 200, description: 'The submission.' },
  },
  {
    method: 'post',
    path: '/api/submissions/{id}/withdraw',
    tag: 'Submissions',
    caller: 'session',
    who: uploadRoles,
    summary: 'Withdraw a submission not yet accepted.',
    params: { id: uuidParam },
    success: { status: 200, description: 'The submission.' },
  },
  {
    method: 'get',
    path: '/api/records',
    tag: 'Test records',
    caller: 'session',
    who: 'browse roles (not estimators)',
    summary: 'Published test records and the active firm’s own (shared, anonymised fields).',
    query: pageQuerySchema,
    success: { status: 200, description: '{ records }' },
  },
  {
    method: 'get',
    path: '/api/records/{id}',
    tag: 'Test records',
    caller: 'session',
    who: 'browse roles (not estimators)',
    summary: 'One record with its stress levels; private fields only for the owning firm.',
    params: { id: uuidParam },
    success: { status: 200, description: 'The record.' },
  },
  {
    method: 'get',
    path: '/api/review',
    tag: 'Review',
    caller: 'session',
    who: 'data steward',
    summary: 'Submissions waiting for review, oldest first.',
    success: { status: 200, description: 'The queue.' },
  },
  {
    method: 'get',
    path: '/api/review/{id}',
    tag: 'Review',
    caller: 'session',
    who: 'data steward',
    summary: 'A submission’s records against their deposit, with flags, readings and history.',
    params: { id: uuidParam },
    success: { status: 200, description: 'The submission as reviewed.' },
  },
  {
    method: 'post',
    path: '/api/review/{id}/decision',
    tag: 'Review',
    caller: 'session',
    who: 'data steward',
    summary: 'Accept (publishes in a new bank version), return with comments, or reject.',
    params: { id: uuidParam },
    body: json(reviewDecisionSchema),
    success: { status: 200, description: 'The decision.' },
  },
  {
    method: 'get',
    path: '/api/estimates',
    tag: 'Estimates',
    caller: 'session',
    who: estimateRoles,
    summary: 'Saved estimates of the active firm.',
    success: { status: 200, description: '{ estimates }' },
  },
  {
    method: 'post',
    path: '/api/estimates',
    tag: 'Estimates',
    caller: 'session',
    who: estimateRoles,
    summary: 'Save an estimate.',
    body: json(saveEstimateSchema),
    success: { status: 201, description: 'The saved estimate.' },
  },
  {
    method: 'post',
    path: '/api/estimates/preview',
    tag: 'Estimates',
    caller: 'session',
    who: estimateRoles,
    summary:
      'Settlement and time rate of a layered profile, with P10/P50/P90 ranges when distributions are given. Nothing is saved.',
    body: json(estimatePreviewSchema),
    success: {
      status: 200,
      description: 'The preview (settlement, sublayers, time curve, ranges, methods, warnings, cautions, units).',
    },
  },
  {
    method: 'get',
    path: '/api/health',
    tag: 'Service',
    caller: 'anyone',
    who: 'anyone',
    summary: 'Database, mail and search each up, down or not configured; 503 when the database is down.',
    success: { status: 200, description: '{ status, database, mail, search }' },
  },
  {
    method: 'get',
    path: '/api/openapi.json',
    tag: 'Service',
    caller: 'anyone',
    who: 'anyone',
    summary: 'This description of the API (OpenAPI 3).',
    success: { status: 200, description: 'The OpenAPI document.' },
  },
];
