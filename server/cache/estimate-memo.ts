import { LRUCache } from "lru-cache";
import type { LibraryCache } from "./library-cache";

/**
 * The live preview's answers, as the JSON bytes sent, per organization and exact request body
 * text (the route reads it unparsed, so a known body is never parsed at all). The
 * engine is a pure function of the body and the library versions it names, so an answer stays
 * right until the library changes (the library cache's version is part of every entry). The
 * preview asks the same question often: every viewer opening a saved design, a refetch when a
 * tab regains focus, an edit undone. Identical requests in flight share one computation; a
 * failed one (a 400) is not kept.
 */
export class EstimateMemo {
  private readonly entries: LRUCache<string, { libraryVersion: number; json: Promise<Buffer> }>;

  constructor(
    private readonly library: LibraryCache,
    options: { max?: number } = {},
  ) {
    // Bounded by count and by size: a key holds a whole body (up to the 1 MB body limit), and an
    // answer is some 10 to 40 kB, counted here before it is known.
    this.entries = new LRUCache({ max: options.max ?? 500, maxSize: 64 * 1024 * 1024, sizeCalculation: (_entry, key) => key.length + 64 * 1024 });
  }

  answer(route: string, organizationId: string, bodyText: string, compute: () => Promise<unknown>): Promise<Buffer> {
    const key = `${route}|${organizationId}|${bodyText}`;
    const libraryVersion = this.library.version;
    const known = this.entries.get(key);
    if (known && known.libraryVersion === libraryVersion) return known.json;
    const json = compute().then((answer) => Buffer.from(JSON.stringify(answer)));
    this.entries.set(key, { libraryVersion, json });
    json.catch(() => {
      if (this.entries.get(key)?.json === json) this.entries.delete(key);
    });
    return json;
  }
}
