import type { Transaction } from 'kysely';
import type { BankVersionEntry } from '../../contracts/versions';
import type { Database } from '../db/schema';

/** Bank versions, newest first, with the publisher's name and the published records that carry each number. */
export async function listBankVersions(
  trx: Transaction<Database>,
  page: { limit: number; offset: number },
): Promise<BankVersionEntry[]> {
  return trx
    .selectFrom('bank_version as v')
    .leftJoin('user as u', 'u.id', 'v.published_by')
    .select(['v.id', 'v.published_at as publishedAt', 'u.name as publishedBy', 'v.record_count as recordCount', 'v.note'])
    .select((eb) =>
      eb
        .selectFrom('test_record as t')
        .whereRef('t.bank_version_id', '=', 'v.id')
        .where('t.status', '=', 'published')
        .select(eb.fn.countAll<number>().as('n'))
        .as('recordsNowInVersion'),
    )
    .orderBy('v.id', 'desc')
    .limit(page.limit)
    .offset(page.offset)
    .execute() as Promise<BankVersionEntry[]>;
}

export async function countBankVersions(trx: Transaction<Database>): Promise<number> {
  const row = await trx
    .selectFrom('bank_version')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .executeTakeFirstOrThrow();
  return Number(row.n);
}
