import type { Transaction } from 'kysely';
import type { Database } from '../db/schema';

export interface Recipient {
  email: string;
  name: string;
}

/** Every data steward who is not suspended. */
export async function stewardRecipients(trx: Transaction<Database>): Promise<Recipient[]> {
  return trx.selectFrom('user').select(['email', 'name']).where('role', '=', 'steward').where('banned', 'is not', true).execute();
}

export async function personRecipient(trx: Transaction<Database>, userId: string): Promise<Recipient | undefined> {
  return trx.selectFrom('user').select(['email', 'name']).where('id', '=', userId).executeTakeFirst();
}
