/**
 * Load benchmark of POST /api/estimate (the live preview), beside a bare Express JSON endpoint
 * in the same process and run, so the ratio shows what sessions, validation and the engine cost.
 * Two bodies, as the design page sends them on every edit: the quick figures (sweep: false) and
 * the whole prediction with its layer-count sweep.
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
  const baseline = await run(`http://127.0.0.1:${barePort}/echo`, request(body));
  const figures = await run(`${stack.origin}/api/estimate`, request(figuresBody));
  const estimate = await run(`${stack.origin}/api/estimate`, request(body));
  bareServer.close();
  // autocannon stops on the clock, not on its last answers: let those land before the stack stops.
  await new Promise((resolve) => setTimeout(resolve, 1500));

  const failures = estimate.non2xx + estimate.errors + figures.non2xx + figures.errors;
  const line = (name: string, r: Result) =>
    `${name.padEnd(22)} ${r.requests.average.toFixed(0).padStart(7)} req/s   p50 ${String(r.latency.p50).padStart(4)} ms   p99 ${String(r.latency.p99).padStart(4)} ms`;
  console.log(`\nPOST /api/estimate load (${CONNECTIONS} connections, ${DURATION_S} s each, body ${body.length} bytes)`);
  const ratio = (r: Result) => `${((r.requests.average / baseline.requests.average) * 100).toFixed(1)} %`;
  console.log(line("bare Express JSON", baseline));
  console.log(line("estimate, figures", figures) + `   ratio ${ratio(figures)}`);
  console.log(line("estimate, with sweep", estimate) + `   ratio ${ratio(estimate)}`);
  console.log(`targets: ≥ 70 % of the bare endpoint, p99 ≤ 50 ms; failed requests ${failures}`);
  if (failures > 0) process.exitCode = 1;
} finally {
  await stack.stop();
}
