import { LRUCache } from "lru-cache";
import type { Actor } from "../services/context";

/**
 * Who a session cookie belongs to, remembered for a few seconds so the live preview's stream of
 * requests does not ask the database twice per keystroke. Everything that changes who a session
 * is (sign-out, a role change, a removal, a password reset) forgets the entry at once, so the
 * short lifetime only bounds what a change made outside this process (plain SQL) could miss.
 * One process holds it: a second server process would need a shared invalidation.
 */
export class AuthCache {
  private readonly entries: LRUCache<string, Actor>;
  // Bumped by every forget: a lookup that began before one must not store what it read.
  private generation = 0;

  constructor(options: { max?: number; ttl_ms?: number } = {}) {
    this.entries = new LRUCache({ max: options.max ?? 10_000, ttl: options.ttl_ms ?? 15_000 });
  }

  get(sessionId: string): Actor | undefined {
    return this.entries.get(sessionId);
  }

  /** Taken before reading the database; remember() keeps nothing if a forget came in between. */
  ticket(): number {
    return this.generation;
  }

  /** Never past the session's own expiry. */
  remember(actor: Actor, sessionExpiresAt: Date, ticket: number, now = Date.now()) {
    const left = sessionExpiresAt.getTime() - now;
    if (left <= 0 || ticket !== this.generation) return;
    this.entries.set(actor.sessionId, actor, { ttl: Math.min(left, this.entries.ttl) });
  }

  forgetSession(sessionId: string) {
    this.generation += 1;
    this.entries.delete(sessionId);
  }

  forgetUser(userId: string) {
    this.generation += 1;
    for (const [sessionId, actor] of this.entries.entries()) if (actor.userId === userId) this.entries.delete(sessionId);
  }
}
