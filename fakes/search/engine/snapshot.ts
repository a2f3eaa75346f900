// The data folder: one JSON file per index (settings and documents) and one for the tasks, each
// written to a temporary file, flushed and renamed over the old one, so a crash never leaves half a file.
import { mkdirSync, readdirSync, readFileSync } from 'node:fs';
import { open, rename, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { type Doc, idOfDocument } from './documents';
import { SearchIndex } from './search-index';
import { defaultSettings, type Settings } from './settings';
import type { StoredTask } from './tasks';

interface IndexFile {
  uid: string;
  primaryKey: string | null;
  createdAt: string;
  updatedAt: string;
  settings: Settings;
  documents: Doc[];
}

export interface TasksFile {
  nextTaskUid: number;
  nextBatchUid: number;
  tasks: StoredTask[];
}

const KEPT_FINISHED_TASKS = 10_000;

async function writeAtomically(path: string, text: string): Promise<void> {
  const temporary = `${path}.tmp-${process.pid}`;
  const handle = await open(temporary, 'w');
  try {
    await handle.writeFile(text);
    await handle.sync();
  } finally {
    await handle.close();
  }
  await rename(temporary, path);
  const folder = await open(join(path, '..'), 'r');
  try {
    await folder.sync();
  } finally {
    await folder.close();
  }
}

export class SnapshotStore {
  private readonly indexDir: string;

  constructor(private readonly dir: string) {
    this.indexDir = join(dir, 'indexes');
    mkdirSync(this.indexDir, { recursive: true });
  }

  async saveIndex(index: SearchIndex): Promise<void> {
    const file: IndexFile = {
      uid: index.uid,
      primaryKey: index.primaryKey,
      createdAt: index.createdAt,
      updatedAt: index.updatedAt,
      settings: index.settings,
      documents: index.allDocuments(),
    };
    await writeAtomically(join(this.indexDir, `${index.uid}.json`), JSON.stringify(file));
  }

  async dropIndex(uid: string): Promise<void> {
    await rm(join(this.indexDir, `${uid}.json`), { force: true });
  }

  async saveTasks(file: TasksFile): Promise<void> {
    const finished = file.tasks.filter((t) => t.status === 'succeeded' || t.status === 'failed' || t.status === 'canceled');
    const cutoff = finished.length > KEPT_FINISHED_TASKS ? (finished[finished.length - KEPT_FINISHED_TASKS]?.uid ?? 0) : 0;
    const tasks = file.tasks.filter((t) => t.uid >= cutoff || t.operation);
    await writeAtomically(join(this.dir, 'tasks.json'), JSON.stringify({ ...file, tasks }));
  }

  loadIndexes(): SearchIndex[] {
    return readdirSync(this.indexDir)
      .filter((name) => name.endsWith('.json'))
      .map((name) => {
        const file = JSON.parse(readFileSync(join(this.indexDir, name), 'utf8')) as IndexFile;
        const index = new SearchIndex(file.uid, file.primaryKey, file.createdAt);
        index.settings = { ...defaultSettings(), ...file.settings };
        for (const doc of file.documents) index.put(idOfDocument(doc, file.primaryKey as string), doc);
        index.updatedAt = file.updatedAt;
        return index;
      });
  }

  loadTasks(): TasksFile | null {
    try {
      return JSON.parse(readFileSync(join(this.dir, 'tasks.json'), 'utf8')) as TasksFile;
    } catch {
      return null;
    }
  }
}
