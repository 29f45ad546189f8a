import { describe, expect, it } from "vitest";
import { AuthCache } from "./auth-cache";
import { EstimateMemo } from "./estimate-memo";
import { LibraryCache } from "./library-cache";

const actor = (sessionId: string, userId = "u1") => ({ sessionId, userId, organizationId: "o1", role: "engineer" as const });
const inAnHour = () => new Date(Date.now() + 3_600_000);

describe("AuthCache", () => {
  it("keeps nothing read before a forget, so a request in flight cannot bring back a signed-out session", () => {
    const cache = new AuthCache();
    const before = cache.ticket();
    cache.forgetSession("s1"); // the sign-out lands while the lookup is still reading
    cache.remember(actor("s1"), inAnHour(), before);
    expect(cache.get("s1")).toBeUndefined();
    cache.remember(actor("s1"), inAnHour(), cache.ticket());
    expect(cache.get("s1")?.userId).toBe("u1");
  });

  it("forgets every session of a user and no one else's", () => {
    const cache = new AuthCache();
    for (const [s, u] of [["a", "u1"], ["b", "u1"], ["c", "u2"]]) cache.remember(actor(s, u), inAnHour(), cache.ticket());
    cache.forgetUser("u1");
    expect([cache.get("a"), cache.get("b"), cache.get("c")?.userId]).toEqual([undefined, undefined, "u2"]);
  });

  it("never keeps a session past its own expiry", () => {
    const cache = new AuthCache({ ttl_ms: 60_000 });
    cache.remember(actor("gone"), new Date(Date.now() - 1), cache.ticket());
    expect(cache.get("gone")).toBeUndefined();
  });
});

describe("EstimateMemo", () => {
  it("answers a repeated body from memory until the library changes", async () => {
    const library = new LibraryCache();
    const memo = new EstimateMemo(library);
    let computed = 0;
    const ask = (body: unknown, org = "o1") => memo.answer("estimate", org, JSON.stringify(body), async () => ({ n: ++computed }));
    const first = JSON.parse((await ask({ a: 1 })).toString());
    expect(JSON.parse((await ask({ a: 1 })).toString())).toEqual(first);
    expect(computed).toBe(1);
    await ask({ a: 2 });
    await ask({ a: 1 }, "o2"); // another organization sees its own library
    expect(computed).toBe(3);
    library.changed();
    expect(JSON.parse((await ask({ a: 1 })).toString())).toEqual({ n: 4 });
  });

  it("shares one computation between identical requests in flight and keeps no failure", async () => {
    const memo = new EstimateMemo(new LibraryCache());
    let computed = 0;
    const slow = () => memo.answer("estimate", "o1", '{"a":1}', async () => {
      computed += 1;
      await new Promise((r) => setTimeout(r, 10));
      return { ok: true };
    });
    await Promise.all([slow(), slow(), slow()]);
    expect(computed).toBe(1);
    const failing = () => memo.answer("estimate", "o1", '{"bad":true}', async () => {
      computed += 1;
      throw new Error("layup.0.layers must be at most 200");
    });
    await expect(failing()).rejects.toThrow("layup.0.layers");
    await expect(failing()).rejects.toThrow("layup.0.layers");
    expect(computed).toBe(3);
  });
});
