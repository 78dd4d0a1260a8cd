/**
 * Where the work is kept between visits: IndexedDB (large records, file bytes as they are),
 * or localStorage where IndexedDB cannot be opened (text only, about 5 MB in common browsers:
 * a file origin larger than that fails with a message). A record that could not be read is
 * moved aside ("unreadable"), never deleted, so a later page version or a person can recover it.
 *
 * Failures are reported, never swallowed: `storageProblem` turns the browser's errors into a
 * sentence (a full quota above all: "QuotaExceededError", WHATWG Storage and IndexedDB specs).
 */
import { encodeWorkText, type StoredWork } from "./storedWork";

export interface WorkStore {
  readonly kind: "IndexedDB" | "localStorage";
  load(): Promise<unknown>;
  save(work: StoredWork): Promise<void>;
  /** Keeps a record that could not be restored under another key, out of the way. */
  setAside(value: unknown): Promise<void>;
  clear(): Promise<void>;
}

const DB = "spanwise-workbench";
const STORE = "work";
const CURRENT = "current";
const UNREADABLE = "unreadable";
const LOCAL_KEY = "spanwise-workbench:current";
const LOCAL_UNREADABLE = "spanwise-workbench:unreadable";

export class StorageFailure extends Error {}

/** A sentence for a storage error. */
export function storageProblem(error: unknown): string {
  const name = error instanceof Error || (typeof DOMException !== "undefined" && error instanceof DOMException) ? (error as Error).name : "";
  const message = error instanceof Error ? error.message : String(error);
  if (name === "QuotaExceededError" || /quota/i.test(message)) return "the browser's storage for this page is full (free space, or save the workbook as a file)";
  if (name === "SecurityError" || name === "InvalidStateError") return `the browser does not allow storage for this page (${message || name})`;
  return message || name || "the browser's storage failed";
}

function request<T>(req: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error ?? new StorageFailure("the storage request failed"));
  });
}

function done(tx: IDBTransaction): Promise<void> {
  return new Promise((resolve, reject) => {
    tx.oncomplete = () => resolve();
    tx.onerror = () => reject(tx.error ?? new StorageFailure("the storage transaction failed"));
    tx.onabort = () => reject(tx.error ?? new StorageFailure("the storage transaction was aborted"));
  });
}

class IndexedDbStore implements WorkStore {
  readonly kind = "IndexedDB";
  constructor(private readonly db: IDBDatabase) {}

  async load(): Promise<unknown> {
    return request(this.db.transaction(STORE, "readonly").objectStore(STORE).get(CURRENT));
  }

  private async put(key: string, value: unknown): Promise<void> {
    const tx = this.db.transaction(STORE, "readwrite");
    tx.objectStore(STORE).put(value, key);
    await done(tx);
  }

  save(work: StoredWork): Promise<void> {
    return this.put(CURRENT, work);
  }

  setAside(value: unknown): Promise<void> {
    return this.put(UNREADABLE, value);
  }

  async clear(): Promise<void> {
    const tx = this.db.transaction(STORE, "readwrite");
    tx.objectStore(STORE).delete(CURRENT);
    await done(tx);
  }
}

class LocalStore implements WorkStore {
  readonly kind = "localStorage";
  constructor(private readonly storage: Storage) {}

  async load(): Promise<unknown> {
    return this.storage.getItem(LOCAL_KEY) ?? undefined;
  }

  async save(work: StoredWork): Promise<void> {
    this.storage.setItem(LOCAL_KEY, encodeWorkText(work));
  }

  async setAside(value: unknown): Promise<void> {
    this.storage.setItem(LOCAL_UNREADABLE, typeof value === "string" ? value : JSON.stringify(value ?? null));
  }

  async clear(): Promise<void> {
    this.storage.removeItem(LOCAL_KEY);
  }
}

function openDb(factory: IDBFactory): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const req = factory.open(DB, 1);
    req.onupgradeneeded = () => req.result.createObjectStore(STORE);
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error ?? new StorageFailure("IndexedDB could not be opened"));
    req.onblocked = () => reject(new StorageFailure("IndexedDB is blocked by another tab of this page"));
  });
}

/** The best store this browser offers; throws StorageFailure saying why there is none. */
export async function openStore(scope: { indexedDB?: IDBFactory; localStorage?: Storage } = globalScope()): Promise<WorkStore> {
  let reason = "";
  if (scope.indexedDB) {
    try {
      return new IndexedDbStore(await openDb(scope.indexedDB));
    } catch (error) {
      reason = storageProblem(error);
    }
  }
  try {
    if (scope.localStorage) return new LocalStore(scope.localStorage);
  } catch (error) {
    reason = storageProblem(error);
  }
  throw new StorageFailure(`no browser storage for this page${reason ? ` (${reason})` : ""}`);
}

function globalScope(): { indexedDB?: IDBFactory; localStorage?: Storage } {
  const out: { indexedDB?: IDBFactory; localStorage?: Storage } = {};
  try {
    out.indexedDB = window.indexedDB;
  } catch {
    // blocked by the browser's settings
  }
  try {
    out.localStorage = window.localStorage;
  } catch {
    // blocked by the browser's settings
  }
  return out;
}
