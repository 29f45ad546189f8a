/**
 * Load benchmark of POST /api/estimate (the live preview), beside a bare Express JSON endpoint
 * in the same process and run, so the ratio shows what sessions, validation and the engine cost.
 * The estimate route reads its body as text and looks it up in the memo before parsing it.
 * Two bodies, as the design page sends them on every edit: the quick figures (sweep: false) and
 * the whole prediction with its layer-count sweep. Repeated bodies are answered by the estimate
 * memo (server/cache/estimate-memo.ts), so two more runs send a new warm temperature on every
 * request and show what the engine itself costs. The bare endpoint runs before and after the
 * others; ratios are against the mean of the two, so a machine that slows down mid-run shows.
 * It prints figures and never fails on them (target: ≥ 70 % of the bare endpoint's throughput,
 * p99 ≤ 50 ms). Run through `npm run bench`; its own ports and data folder keep it apart.
 */
import type { AddressInfo } from "node:net";
import autocannon from "autocannon";
import express from "express";
import { startLocalStack } from "../../server/local/stack";

const CONNECTIONS = 50;
const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);
const port = Number(process.env.BENCH_PORT ?? 3150);
const DESIGN = "250 L helium magnet cryostat";

const stack = await startLocalStack({
  dataDir: ".data/bench-mariadb",
  port,
  dbPort: Number(process.env.BENCH_DB_PORT ?? 3359),
  smtpPort: Number(process.env.BENCH_SMTP_PORT ?? 2555),
  database: "frostfold_bench",
  freshDatabase: true,
  log: () => {},
});

async function call(path: string, init: RequestInit & { cookie?: string } = {}) {
  const res = await fetch(`${stack.origin}${path}`, {
    ...init,
    headers: { "content-type": "application/json", origin: stack.origin, ...(init.cookie ? { cookie: init.cookie } : {}) },
  });
  if (!res.ok) throw new Error(`${init.method ?? "GET"} ${path}: ${res.status} ${await res.text()}`);
  return res;
}

type Result = autocannon.Result;
const run = (url: string, options: Partial<autocannon.Options>) =>
  new Promise<Result>((resolve, reject) => {
    autocannon({ url, connections: CONNECTIONS, duration: DURATION_S, ...options }, (error, result) => (error ? reject(error) : resolve(result)));
  });

try {
  // A signed-in engineer and the content of a seeded design: the body the live preview sends.
  const signIn = await call("/api/auth/sign-in", { method: "POST", body: JSON.stringify({ email: "engineer@kestrelbay.example", password: "frostfold-demo" }) });
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const { designs } = (await (await call("/api/designs", { cookie })).json()) as { designs: { id: string; name: string }[] };
  const design = designs.find((d) => d.name === DESIGN);
  if (!design) throw new Error(`the demo design "${DESIGN}" is missing`);
  const detail = (await (await call(`/api/designs/${design.id}`, { cookie })).json()) as { latest: { content: unknown } };
  const body = JSON.stringify({ content: detail.latest.content });
  const figuresBody = JSON.stringify({ content: detail.latest.content, sweep: false });
  await call("/api/estimate", { method: "POST", body, cookie });

  // The bare endpoint: JSON in, a small JSON out, nothing else.
  const bare = express();
  bare.use(express.json({ limit: "1mb" }));
  bare.post("/echo", (req, res) => res.json({ ok: true, keys: Object.keys(req.body as object).length }));
  const bareServer = bare.listen(0, "127.0.0.1");
  await new Promise((resolve) => bareServer.once("listening", resolve));
  const barePort = (bareServer.address() as AddressInfo).port;

  const request = (b: string) => ({ method: "POST" as const, body: b, headers: { "content-type": "application/json", origin: stack.origin, cookie } });
  // A body no request has sent before: the warm wall a few microkelvin warmer each time.
  const content = detail.latest.content as { warm: { temperature_K: number } };
  let sent = 0;
  const everNew = (sweep: boolean) => ({
    ...request(""),
    requests: [
      {
        setupRequest: (r: autocannon.Request) => {
          sent += 1;
          const warm = { ...content.warm, temperature_K: content.warm.temperature_K + sent * 1e-6 };
          return { ...r, body: JSON.stringify({ content: { ...content, warm }, sweep }) };
        },
      },
    ],
  });
  // A short unmeasured warm-up of both, so neither is timed while the JIT is still compiling it.
  await run(`http://127.0.0.1:${barePort}/echo`, { ...request(body), duration: 2 });
  await run(`${stack.origin}/api/estimate`, { ...request(figuresBody), duration: 2 });
  const bareBefore = await run(`http://127.0.0.1:${barePort}/echo`, request(body));
  const figures = await run(`${stack.origin}/api/estimate`, request(figuresBody));
  const estimate = await run(`${stack.origin}/api/estimate`, request(body));
  const figuresComputed = await run(`${stack.origin}/api/estimate`, everNew(false));
  const estimateComputed = await run(`${stack.origin}/api/estimate`, everNew(true));
  const bareAfter = await run(`http://127.0.0.1:${barePort}/echo`, request(body));
  bareServer.close();
  // autocannon stops on the clock, not on its last answers: let those land before the stack stops.
  await new Promise((resolve) => setTimeout(resolve, 1500));

  const runs = [figures, estimate, figuresComputed, estimateComputed];
  const failures = runs.reduce((sum, r) => sum + r.non2xx + r.errors, 0);
  const bareMean = (bareBefore.requests.average + bareAfter.requests.average) / 2;
  const line = (name: string, r: Result) =>
    `${name.padEnd(27)} ${r.requests.average.toFixed(0).padStart(7)} req/s   p50 ${String(r.latency.p50).padStart(4)} ms   p99 ${String(r.latency.p99).padStart(4)} ms`;
  console.log(`\nPOST /api/estimate load (${CONNECTIONS} connections, ${DURATION_S} s each, body ${body.length} bytes)`);
  const ratio = (r: Result) => `${((r.requests.average / bareMean) * 100).toFixed(1)} %`;
  console.log(line("bare Express JSON, before", bareBefore));
  console.log(line("bare Express JSON, after", bareAfter));
  console.log(line("figures, repeated body", figures) + `   ratio ${ratio(figures)}`);
  console.log(line("with sweep, repeated body", estimate) + `   ratio ${ratio(estimate)}`);
  console.log(line("figures, new body each", figuresComputed) + `   ratio ${ratio(figuresComputed)}`);
  console.log(line("with sweep, new body each", estimateComputed) + `   ratio ${ratio(estimateComputed)}`);
  console.log(`targets: ≥ 70 % of the bare endpoint, p99 ≤ 50 ms; failed requests ${failures}`);
  if (failures > 0) process.exitCode = 1;
} finally {
  await stack.stop();
}
