// The asynchronous writes, applied one task at a time. Each checks everything before it changes
// anything, so a failed task leaves the index as it was.
import { indexNotFound, SearchFakeError } from '../errors';
import { filterDocuments } from '../filter/evaluate';
import { filterFromJson } from '../filter/from-json';
import { type Doc, idOfDocument, inferPrimaryKey } from './documents';
import { SearchIndex } from './search-index';
import { mergeSettings } from './settings-validation';

export type Operation =
  | { type: 'indexCreation'; indexUid: string; primaryKey: string | null }
  | { type: 'indexUpdate'; indexUid: string; primaryKey: string | null }
  | { type: 'indexDeletion'; indexUid: string }
  | { type: 'documentAdditionOrUpdate'; indexUid: string; documents: Doc[]; primaryKey: string | null; merge: boolean }
  | { type: 'documentDeletion'; indexUid: string; ids?: string[]; filter?: unknown; clear?: boolean }
  | { type: 'settingsUpdate'; indexUid: string; changes: Record<string, unknown> };

export type Indexes = Map<string, SearchIndex>;

function need(indexes: Indexes, uid: string): SearchIndex {
  const index = indexes.get(uid);
  if (!index) throw indexNotFound(uid);
  return index;
}

function addDocuments(indexes: Indexes, op: Extract<Operation, { type: 'documentAdditionOrUpdate' }>) {
  const existing = indexes.get(op.indexUid);
  let primaryKey = existing?.primaryKey ?? null;
  if (primaryKey && op.primaryKey && op.primaryKey !== primaryKey) {
    throw new SearchFakeError('index_primary_key_already_exists', `Index already has a primary key: \`${primaryKey}\`.`);
  }
  primaryKey = primaryKey ?? op.primaryKey ?? inferPrimaryKey(op.documents[0]);
  const key = primaryKey;
  const prepared = op.documents.map((doc) => ({ id: idOfDocument(doc, key), doc }));
  const index = existing ?? new SearchIndex(op.indexUid, primaryKey);
  index.primaryKey = primaryKey;
  if (!existing) indexes.set(op.indexUid, index);
  for (const { id, doc } of prepared) {
    const before = op.merge ? index.getByExternal(id) : undefined;
    index.put(id, before ? { ...before, ...doc } : doc);
  }
  index.touch();
  return { receivedDocuments: op.documents.length, indexedDocuments: op.documents.length };
}

function deleteDocuments(indexes: Indexes, op: Extract<Operation, { type: 'documentDeletion' }>) {
  const index = need(indexes, op.indexUid);
  let deleted = 0;
  if (op.clear) {
    const ids = [...index.internalIds.keys()];
    for (const id of ids) if (index.delete(id)) deleted += 1;
    index.touch();
    return { deletedDocuments: deleted };
  }
  if (op.ids) {
    for (const id of op.ids) if (index.delete(id)) deleted += 1;
    index.touch();
    return { providedIds: op.ids.length, deletedDocuments: deleted };
  }
  const node = filterFromJson(op.filter, 'invalid_document_filter');
  const matched = filterDocuments(index, node, 'invalid_document_filter');
  const externals: string[] = [];
  matched.forEach((id) => {
    externals.push(index.externalIds[id] as string);
  });
  for (const id of externals) if (index.delete(id)) deleted += 1;
  index.touch();
  return { providedIds: 0, deletedDocuments: deleted, originalFilter: JSON.stringify(op.filter) };
}

function updateSettings(indexes: Indexes, op: Extract<Operation, { type: 'settingsUpdate' }>) {
  const index = indexes.get(op.indexUid) ?? new SearchIndex(op.indexUid, null);
  const { next } = mergeSettings(index.settings, op.changes);
  const same = (key: 'searchableAttributes' | 'filterableAttributes' | 'sortableAttributes' | 'rankingRules') =>
    JSON.stringify(next[key]) === JSON.stringify(index.settings[key]);
  const facetsChanged = !same('filterableAttributes') || !same('sortableAttributes') || !same('rankingRules');
  const searchableChanged = !same('searchableAttributes');
  index.settings = next;
  if (facetsChanged) index.reindexFacets();
  if (searchableChanged) index.reindexText();
  indexes.set(op.indexUid, index);
  index.touch();
  return op.changes;
}

/** Applies one task's change; returns the task's details. Throws SearchFakeError for a failed task. */
export function applyOperation(indexes: Indexes, op: Operation): Record<string, unknown> {
  switch (op.type) {
    case 'indexCreation':
      if (indexes.has(op.indexUid)) throw new SearchFakeError('index_already_exists', `Index \`${op.indexUid}\` already exists.`);
      indexes.set(op.indexUid, new SearchIndex(op.indexUid, op.primaryKey));
      return { primaryKey: op.primaryKey };
    case 'indexUpdate': {
      const index = need(indexes, op.indexUid);
      if (op.primaryKey !== null && op.primaryKey !== index.primaryKey) {
        if (index.documentCount > 0 && index.primaryKey) {
          throw new SearchFakeError(
            'index_primary_key_already_exists',
            `Index already has a primary key: \`${index.primaryKey}\`.`,
          );
        }
        index.primaryKey = op.primaryKey;
      }
      index.touch();
      return { primaryKey: op.primaryKey };
    }
    case 'indexDeletion': {
      const index = need(indexes, op.indexUid);
      indexes.delete(op.indexUid);
      return { deletedDocuments: index.documentCount };
    }
    case 'documentAdditionOrUpdate':
      return addDocuments(indexes, op);
    case 'documentDeletion':
      return deleteDocuments(indexes, op);
    case 'settingsUpdate':
      return updateSettings(indexes, op);
  }
}

/** What a task's details say before it has run. */
export function enqueuedDetails(op: Operation): Record<string, unknown> {
  switch (op.type) {
    case 'indexCreation':
    case 'indexUpdate':
      return { primaryKey: op.primaryKey };
    case 'indexDeletion':
      return { deletedDocuments: null };
    case 'documentAdditionOrUpdate':
      return { receivedDocuments: op.documents.length, indexedDocuments: null };
    case 'documentDeletion':
      if (op.clear) return { deletedDocuments: null };
      if (op.ids) return { providedIds: op.ids.length, deletedDocuments: null };
      return { providedIds: 0, deletedDocuments: null, originalFilter: JSON.stringify(op.filter) };
    case 'settingsUpdate':
      return op.changes;
  }
}
