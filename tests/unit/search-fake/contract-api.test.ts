// Contract: indexes, documents, settings, the task lifecycle, the error envelope and codes, the key,
// and (fake only) persistence across a restart. Expected behaviour from the engine's API reference
// (Meilisearch docs: "Asynchronous operations", "Documents", "Settings", "Errors", "Authorization").
import { MeilisearchApiError } from 'meilisearch';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiError, idsOf, seedSoilIndex } from './support/seed';
import { SOIL_RECORDS } from './support/soil-records';
import { type ContractTarget, SKIP_NOTE, startTarget, TARGETS, uniqueUid } from './support/targets';

async function raw(target: ContractTarget, method: string, path: string, body?: string, headers: Record<string, string> = {}) {
  const response = await fetch(`${target.url}${path}`, {
    method,
    body,
    headers: { authorization: `Bearer ${target.key}`, 'content-type': 'application/json', ...headers },
  });
  const text = await response.text();
  return { status: response.status, body: text ? JSON.parse(text) : undefined };
}

describe.each(TARGETS)('the API of $name', ({ name, real, skip }) => {
  describe.skipIf(skip)(`${name}${real ? SKIP_NOTE : ''}`, () => {
    let target: ContractTarget;
    const created: string[] = [];
    const fresh = (label: string) => {
      const uid = uniqueUid(label);
      created.push(uid);
      return uid;
    };

    beforeAll(async () => {
      target = await startTarget(real);
    });
    afterAll(async () => {
      for (const uid of created) await target?.client.deleteIndexIfExists(uid);
      await target?.close();
    });

    describe('tasks', () => {
      it('enqueue a write, then report it processed, with its details', async () => {
        const uid = fresh('task');
        const enqueued = await target.client.index(uid).addDocuments([{ id: 1, unit: 'Marsh Peat' }], { primaryKey: 'id' });
        expect(enqueued).toMatchObject({ indexUid: uid, status: 'enqueued', type: 'documentAdditionOrUpdate' });
        expect(typeof enqueued.taskUid).toBe('number');
        expect(Number.isNaN(Date.parse(String(enqueued.enqueuedAt)))).toBe(false);
        const done = await target.client.tasks.waitForTask(enqueued.taskUid);
        expect(done).toMatchObject({
          uid: enqueued.taskUid,
          status: 'succeeded',
          error: null,
          details: { receivedDocuments: 1, indexedDocuments: 1 },
        });
        expect(done.startedAt).not.toBeNull();
        expect(done.finishedAt).not.toBeNull();
        const listed = await target.client.tasks.getTasks({ indexUids: [uid], types: ['documentAdditionOrUpdate'] });
        expect(listed.results.map((t) => t.uid)).toContain(enqueued.taskUid);
      });

      it('report a failed task without changing the index', async () => {
        const uid = fresh('failed');
        await target.client
          .index(uid)
          .addDocuments([{ id: 1, unit: 'Marsh Peat' }], { primaryKey: 'id' })
          .waitTask();
        const failed = await target.client
          .index(uid)
          .addDocuments([
            { id: 2, unit: 'ok' },
            { id: 'not valid!', unit: 'bad' },
          ])
          .waitTask();
        expect(failed.status).toBe('failed');
        expect(failed.error).toMatchObject({ code: 'invalid_document_id', type: 'invalid_request' });
        expect((await target.client.index(uid).getDocuments()).total).toBe(1);
        const missing = await target.client
          .index(uid)
          .addDocuments([{ unit: 'no id' }])
          .waitTask();
        expect(missing.error?.code).toBe('missing_document_id');
      });

      it('answer task_not_found for an unknown task', async () => {
        const error = await apiError(target.client.tasks.getTask(987_654_321));
        expect(error).toMatchObject({ status: 404, code: 'task_not_found' });
      });
    });

    describe('indexes', () => {
      it('are created, read, listed, changed and deleted', async () => {
        const uid = fresh('index');
        expect((await target.client.createIndex(uid, { primaryKey: 'record_id' }).waitTask()).status).toBe('succeeded');
        expect(await target.client.getRawIndex(uid)).toMatchObject({ uid, primaryKey: 'record_id' });
        const listed = await target.client.getRawIndexes({ limit: 1000 });
        expect(listed.results.map((i) => i.uid)).toContain(uid);
        expect((await target.client.updateIndex(uid, { primaryKey: 'other_id' }).waitTask()).status).toBe('succeeded');
        expect((await target.client.getRawIndex(uid)).primaryKey).toBe('other_id');
        const again = await target.client.createIndex(uid).waitTask();
        expect(again.error?.code).toBe('index_already_exists');
        expect((await target.client.deleteIndex(uid).waitTask()).status).toBe('succeeded');
        expect(await apiError(target.client.getRawIndex(uid))).toMatchObject({ status: 404, code: 'index_not_found' });
        const gone = await target.client.deleteIndex(uid).waitTask();
        expect(gone.status).toBe('failed');
        expect(gone.error).toMatchObject({ code: 'index_not_found', type: 'invalid_request' });
      });

      it('refuse names with characters outside letters, digits, - and _', async () => {
        expect(await apiError(target.client.createIndex('bad name!'))).toMatchObject({ status: 400, code: 'invalid_index_uid' });
      });
    });

    describe('documents', () => {
      it('are replaced whole by POST and merged by PUT', async () => {
        const uid = fresh('docs');
        const index = target.client.index(uid);
        await index.addDocuments([{ id: 1, unit: 'Marsh Peat', uscs: 'PT' }], { primaryKey: 'id' }).waitTask();
        await index.addDocuments([{ id: 1, unit: 'Marsh Peat (revised)' }]).waitTask();
        expect(await index.getDocument(1)).toEqual({ id: 1, unit: 'Marsh Peat (revised)' });
        await index.updateDocuments([{ id: 1, uscs: 'OH' }]).waitTask();
        expect(await index.getDocument(1)).toEqual({ id: 1, unit: 'Marsh Peat (revised)', uscs: 'OH' });
        expect(await apiError(index.getDocument(99))).toMatchObject({ status: 404, code: 'document_not_found' });
      });

      it('infer the primary key from the one field ending in "id", and refuse to guess between two', async () => {
        const uid = fresh('infer');
        await target.client
          .index(uid)
          .addDocuments([{ record_id: 'r-1', unit: 'x' }])
          .waitTask();
        expect((await target.client.getRawIndex(uid)).primaryKey).toBe('record_id');
        const two = fresh('two');
        const failed = await target.client
          .index(two)
          .addDocuments([{ record_id: 1, sample_id: 2 }])
          .waitTask();
        expect(failed.error?.code).toBe('index_primary_key_multiple_candidates_found');
        const none = await target.client
          .index(fresh('none'))
          .addDocuments([{ unit: 'x' }])
          .waitTask();
        expect(none.error?.code).toBe('index_primary_key_no_candidate_found');
      });

      it('are read in pages, by filter, and deleted by id, ids, filter and all at once', async () => {
        const uid = fresh('delete');
        await seedSoilIndex(target.client, uid);
        const index = target.client.index(uid);
        const page = await index.getDocuments({ offset: 2, limit: 2, fields: ['id'] });
        expect(page).toMatchObject({ offset: 2, limit: 2, total: 8 });
        expect(page.results).toEqual([{ id: 3 }, { id: 4 }]);
        const fetched = await index.getDocuments({ filter: 'uscs = CH', fields: ['id'] });
        expect(fetched.results).toEqual([{ id: 1 }, { id: 5 }]);
        await index.deleteDocument(1).waitTask();
        await index.deleteDocuments(['2', '3']).waitTask();
        const byFilter = await index.deleteDocuments({ filter: 'depth_m > 10' }).waitTask();
        expect(byFilter.details).toMatchObject({ deletedDocuments: 2 });
        expect(idsOf((await index.getDocuments({ limit: 50 })).results)).toEqual([6, 7, 8]);
        await index.deleteAllDocuments().waitTask();
        expect((await index.getDocuments()).total).toBe(0);
      });

      it('refuse a deletion by filter without a filter, and a malformed payload', async () => {
        const uid = fresh('payload');
        await seedSoilIndex(target.client, uid);
        expect(await raw(target, 'POST', `/indexes/${uid}/documents/delete`, '{}')).toMatchObject({
          status: 400,
          body: { code: 'missing_document_filter' },
        });
        expect(await raw(target, 'POST', `/indexes/${uid}/documents`, '[{"id": 1,')).toMatchObject({
          status: 400,
          body: { code: 'malformed_payload', type: 'invalid_request' },
        });
        expect(await raw(target, 'POST', `/indexes/${uid}/documents`, '')).toMatchObject({
          status: 400,
          body: { code: 'missing_payload' },
        });
        expect(await raw(target, 'POST', `/indexes/${uid}/documents`, 'id,unit', { 'content-type': 'text/plain' })).toMatchObject(
          {
            status: 415,
            body: { code: 'invalid_content_type' },
          },
        );
      });

      it('keep their primary key once set', async () => {
        const uid = fresh('pk');
        await target.client
          .index(uid)
          .addDocuments([{ id: 1 }], { primaryKey: 'id' })
          .waitTask();
        const other = await target.client
          .index(uid)
          .addDocuments([{ id: 2, code: 'x' }], { primaryKey: 'code' })
          .waitTask();
        expect(other.status).toBe('failed');
        expect(other.error?.code).toBe('index_primary_key_already_exists');
        expect((await target.client.index(uid).getDocuments()).total).toBe(1);
      });
    });

    describe('settings', () => {
      it('are updated whole (PATCH) and one at a time, read back, and reset', async () => {
        const uid = fresh('settings');
        await seedSoilIndex(target.client, uid);
        const index = target.client.index(uid);
        const settings = await index.getSettings();
        expect(settings.filterableAttributes).toEqual(['unit', 'uscs', 'depth_m', 'cc', 'tags', 'note', 'lab']);
        expect(settings.sortableAttributes).toEqual(['cc', 'depth_m', 'unit', 'uscs']);
        expect(settings.pagination).toEqual({ maxTotalHits: 1000 });
        expect(settings.faceting?.maxValuesPerFacet).toBe(100);
        await index.updateFilterableAttributes(['uscs']).waitTask();
        await index.updateSortableAttributes(['cc']).waitTask();
        await index.updateSearchableAttributes(['unit']).waitTask();
        await index.updateDisplayedAttributes(['id', 'unit']).waitTask();
        await index.updateFaceting({ maxValuesPerFacet: 7 }).waitTask();
        await index.updatePagination({ maxTotalHits: 50 }).waitTask();
        expect(await index.getFilterableAttributes()).toEqual(['uscs']);
        expect(await index.getSortableAttributes()).toEqual(['cc']);
        expect(await index.getSearchableAttributes()).toEqual(['unit']);
        expect(await index.getDisplayedAttributes()).toEqual(['id', 'unit']);
        expect((await index.getFaceting()).maxValuesPerFacet).toBe(7);
        expect(await index.getPagination()).toEqual({ maxTotalHits: 50 });
        expect(idsOf((await index.search('clay')).hits).sort()).toEqual([1, 2, 5]);
        await index.resetSettings().waitTask();
        const reset = await index.getSettings();
        expect(reset.filterableAttributes).toEqual([]);
        expect(reset.displayedAttributes).toEqual(['*']);
        expect(reset.pagination).toEqual({ maxTotalHits: 1000 });
      });

      it("refuse values of the wrong type with the setting's own code", async () => {
        const uid = fresh('badsettings');
        await seedSoilIndex(target.client, uid);
        const error = await apiError(
          target.client.index(uid).updateSettings({ filterableAttributes: 'uscs' as unknown as string[] }),
        );
        expect(error).toMatchObject({ status: 400, code: 'invalid_settings_filterable_attributes' });
        const pagination = await apiError(target.client.index(uid).updatePagination({ maxTotalHits: -1 }));
        expect(pagination).toMatchObject({ status: 400, code: 'invalid_settings_pagination' });
      });
    });

    describe('search errors', () => {
      let uid: string;
      beforeAll(async () => {
        uid = fresh('errors');
        await seedSoilIndex(target.client, uid);
      });

      it.each([
        [{ sort: ['cc'] }, 'invalid_search_sort'],
        [{ sort: ['description:asc'] }, 'invalid_search_sort'],
        [{ facets: ['description'] }, 'invalid_search_facets'],
        [{ limit: -1 }, 'invalid_search_limit'],
        [{ offset: 'two' }, 'invalid_search_offset'],
        [{ page: -1 }, 'invalid_search_page'],
        [{ hitsPerPage: 'x' }, 'invalid_search_hits_per_page'],
        [{ q: ['clay'] }, 'invalid_search_q'],
        [{ attributesToRetrieve: 'unit' }, 'invalid_search_attributes_to_retrieve'],
        [{ matchingStrategy: 'most' }, 'invalid_search_matching_strategy'],
        [{ filter: 'uscs ==' }, 'invalid_search_filter'],
      ])('%j answers 400 %s', async (params, code) => {
        const { status, body } = await raw(target, 'POST', `/indexes/${uid}/search`, JSON.stringify(params));
        expect(status).toBe(400);
        expect(body).toMatchObject({ code, type: 'invalid_request', link: `https://docs.meilisearch.com/errors#${code}` });
        expect(typeof body.message).toBe('string');
      });

      it('names the sortable attributes when a sort is refused', async () => {
        const error = await apiError(target.client.index(uid).search(null, { sort: ['description:asc'] }));
        expect(error.message).toBe(
          `Index \`${uid}\`: Attribute \`description\` is not sortable. Available sortable attributes are: \`cc, depth_m, unit, uscs\`.`,
        );
      });

      it('answers index_not_found for a search on a missing index, as a MeilisearchApiError', async () => {
        const promise = target.client.index(uniqueUid('missing')).search('clay');
        await expect(promise).rejects.toBeInstanceOf(MeilisearchApiError);
        expect(await apiError(target.client.index(uniqueUid('missing')).search('clay'))).toMatchObject({
          status: 404,
          code: 'index_not_found',
        });
      });
    });

    describe('the key', () => {
      it('is required on every route but /health', async () => {
        const health = await fetch(`${target.url}/health`);
        expect(health.status).toBe(200);
        const none = await fetch(`${target.url}/indexes`);
        expect(none.status).toBe(401);
        expect(await none.json()).toMatchObject({ code: 'missing_authorization_header', type: 'auth' });
        const wrong = await fetch(`${target.url}/indexes`, { headers: { authorization: 'Bearer not-the-key' } });
        expect(wrong.status).toBe(403);
        expect(await wrong.json()).toMatchObject({ code: 'invalid_api_key', type: 'auth' });
      });
    });

    it.skipIf(real)('keeps indexes, settings, documents and tasks across a restart', async () => {
      const uid = fresh('persist');
      await seedSoilIndex(target.client, uid, { pagination: { maxTotalHits: 3 } });
      const lastTask = (await target.client.tasks.getTasks({ indexUids: [uid], limit: 1 })).results[0];
      await target.restart?.();
      const index = target.client.index(uid);
      expect((await index.getDocuments()).total).toBe(SOIL_RECORDS.length);
      expect((await index.getPagination()).maxTotalHits).toBe(3);
      expect(idsOf((await index.search(null, { filter: 'uscs = CH' })).hits)).toEqual([1, 5]);
      expect((await target.client.tasks.getTask(lastTask?.uid as number)).status).toBe('succeeded');
      const next = await index.addDocuments([{ id: 9, unit: 'New' }]).waitTask();
      expect(next.uid).toBeGreaterThan(lastTask?.uid as number);
    });
  });
});
