// Run as a separate process by upload-atomicity.test.ts, which kills it while it stores.
import { createHash } from 'node:crypto';
import { storeSubmission } from '../../../src/lib/server/contribute/store-submission';
import { connectDatabase } from '../../../src/lib/server/db/connect';
import { manyRecords } from './store-fixture';

const env = (name: string) => process.env[name] ?? '';
const { db } = connectDatabase(env('SCRATCH_APP_URL'), { max: 1 });
const bytes = new TextEncoder().encode(`child upload ${env('LABEL')}`);
console.log('storing');
await storeSubmission(
  { db, appUrl: 'http://127.0.0.1:4321' },
  { userId: env('USER_ID'), firmId: env('FIRM_ID'), ipAddress: null, via: 'seed' },
  { kind: 'csv', name: 'child.csv', mediaType: 'text/csv', bytes, sha256: createHash('sha256').update(bytes).digest('hex') },
  manyRecords(Number(env('ROWS')), env('REGION_ID'), env('UNIT_ID')),
);
console.log('stored');
await db.destroy();
