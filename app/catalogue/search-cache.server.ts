import { QueryTypes } from "sequelize";
import { sequelize } from "~/models/index.server";

// Search results are cached per process and keyed by the catalogue's version: the newest
// details.updated_at (one index lookup). Every publication, withdrawal or import rewrites a details
// row, so a change anywhere makes every app server miss on its next request: stateless servers stay
// coherent without a shared cache.
const MAX_ENTRIES = 500;

interface Entry<T> {
  version: string;
  value: T;
}

export class VersionedCache<T> {
  private entries = new Map<string, Entry<T>>();

  constructor(private readonly maxEntries = MAX_ENTRIES) {}

  get(key: string, version: string): T | undefined {
    const entry = this.entries.get(key);
    if (!entry || entry.version !== version) return undefined;
    // Refresh recency: Map keeps insertion order, so the first key is the least recently used.
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry.value;
  }

  set(key: string, version: string, value: T): void {
    this.entries.delete(key);
    this.entries.set(key, { version, value });
    while (this.entries.size > this.maxEntries) {
      const oldest = this.entries.keys().next().value;
      if (oldest === undefined) break;
      this.entries.delete(oldest);
    }
  }

  get size(): number {
    return this.entries.size;
  }
}

export async function catalogueVersion(): Promise<string> {
  const [row] = await sequelize.query<{ version: Date | string | null }>(
    "SELECT MAX(updated_at) AS version FROM details",
    { type: QueryTypes.SELECT },
  );
  return row?.version ? new Date(row.version).toISOString() : "empty";
}
