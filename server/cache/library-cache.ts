import { LRUCache } from "lru-cache";
import type { Tx } from "../db/client";
import { findVisibleMaterialVersions } from "../db/repositories/designs";

type VisibleVersions = Awaited<ReturnType<typeof findVisibleMaterialVersions>>;
export type VersionLoader = (db: Tx, organizationId: string, refs: { materialId: string; version: number }[]) => Promise<VisibleVersions>;

/**
 * The library versions the live preview reads, per organization and set of references. Every
 * library write calls changed() after it commits; a read that started before a change is not
 * kept, so the cache never holds rows older than the last write. Saving a revision reads the
 * database itself, inside its own transaction. One process holds it (see AuthCache).
 */
export class LibraryCache {
  private readonly entries: LRUCache<string, VisibleVersions>;
  private generation = 0;

  /** Bumped by every library write; what was worked out from older rows is stale. */
  get version(): number {
    return this.generation;
  }

  constructor(options: { max?: number; ttl_ms?: number } = {}) {
    this.entries = new LRUCache({ max: options.max ?? 2_000, ttl: options.ttl_ms ?? 60_000 });
  }

  readonly load: VersionLoader = async (db, organizationId, refs) => {
    const key = `${organizationId}|${[...new Set(refs.map((r) => `${r.materialId}@${r.version}`))].sort().join(",")}`;
    const known = this.entries.get(key);
    if (known) return known;
    const started = this.generation;
    const rows = await findVisibleMaterialVersions(db, organizationId, refs);
    if (started === this.generation) this.entries.set(key, rows);
    return rows;
  };

  /** After a library write commits: forget everything, and drop reads still in flight. */
  changed() {
    this.generation += 1;
    this.entries.clear();
  }
}
