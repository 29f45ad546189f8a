/**
 * The 1,000,000-row weighing log benchmark (issue #7), printed and never asserted:
 * `npm run bench` runs it after the engine bench; alone: `npx tsx tests/bench/boil-off-upload.ts`.
 *
 * It starts the real local stack (its own MariaDB in .data/bench-upload-mariadb, the S3 fake, the SMTP
 * fake, migrations and the demo seed), generates an invented log (a steady mass loss plus
 * seeded noise, ISO timestamps a second apart and a barometer column), and sends it over real
 * HTTP to POST /api/boil-off-tests/:id/logs as a browser would: upload → parse → store (file and
 * series in the S3 fake, rows in MariaDB) → fit. Then it reads raw csv-parse speed on the same
 * file, the server's own parse alone, and the time of GET /series (the chart request).
 *
 * UPLOAD_BENCH_ROWS (1,000,000), UPLOAD_BENCH_PORT (3180) and UPLOAD_BENCH_DB_PORT (3389) move it;
 * its folder and ports are its own, apart from the other benchmarks'.
 */
import { createReadStream, createWriteStream, openAsBlob } from "node:fs";
import { mkdtemp, rm, stat } from "node:fs/promises";
import { once } from "node:events";
import os from "node:os";
import path from "node:path";
import { parse } from "csv-parse";
import { Writable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { DEMO_PASSWORD, DEMO_USERS } from "../../server/db/seed/demo";
import { gaussianNoise } from "../../shared/seeded-noise";
import { startLocalStack } from "../../server/local/stack";
import { parseLoggerFile } from "../../server/services/logger-files";

const ROWS = Number(process.env.UPLOAD_BENCH_ROWS ?? 1_000_000);
const PORT = Number(process.env.UPLOAD_BENCH_PORT ?? 3180);
const DB_PORT = Number(process.env.UPLOAD_BENCH_DB_PORT ?? 3389);

const fmt = (x: number) => Math.round(x).toLocaleString("en-US");
const seconds = (ms: number) => `${(ms / 1000).toFixed(2)} s`;


/**
 * Invented: a 160 kg dewar losing `rate_kg_per_s`, 2 g scale noise, one reading a second for
 * about 11.6 days, and a barometer swinging 4 hPa a day.
 */
async function writeLog(file: string, rows: number, rate_kg_per_s: number) {
  const out = createWriteStream(file);
  const noise = gaussianNoise(42); // the same file on every run
  const start = Date.parse("2026-11-02T08:00:00Z");
  let chunk = "timestamp,gross mass (kg),barometer (hPa)\n";
  for (let i = 0; i < rows; i++) {
    const mass = 160 + rate_kg_per_s * i + 0.002 * noise();
    const pressure = 1013 + 4 * Math.sin((2 * Math.PI * i) / 86_400);
    chunk += `${new Date(start + i * 1000).toISOString()},${mass.toFixed(4)},${pressure.toFixed(1)}\n`;
    if (chunk.length > 1 << 20) {
      if (!out.write(chunk)) await once(out, "drain");
      chunk = "";
    }
  }
  out.end(chunk);
  await once(out, "finish");
}

/** Wall and CPU time of one step (CPU is this process's: on a shared machine it says more than the wall clock). */
async function measure<T>(step: () => Promise<T>): Promise<{ result: T; ms: number; cpu_ms: number }> {
  const cpu = process.cpuUsage();
  const started = performance.now();
  const result = await step();
  const used = process.cpuUsage(cpu);
  return { result, ms: performance.now() - started, cpu_ms: (used.user + used.system) / 1000 };
}

/** csv-parse as its documentation streams it: file → parser → records, default options. */
async function rawCsvParse(file: string) {
  let records = 0;
  await pipeline(
    createReadStream(file, { highWaterMark: 1 << 20 }),
    parse(),
    new Writable({ objectMode: true, write: (_record, _encoding, callback) => { records++; callback(); } }),
  );
  return records - 1; // the header
}

async function main() {
  const dir = await mkdtemp(path.join(os.tmpdir(), "frostfold-bench-"));
  const file = path.join(dir, "weighing-1m.csv");
  console.log(`\nboil-off upload benchmark: ${fmt(ROWS)}-row weighing log (printed, never asserted)`);
  console.log(`machine: ${os.cpus().length} × ${os.cpus()[0]?.model ?? "cpu"}, load average ${os.loadavg().map((l) => l.toFixed(2)).join(" ")}, node ${process.version}`);

  const stack = await startLocalStack({
    dataDir: ".data/bench-upload-mariadb",
    port: PORT,
    dbPort: DB_PORT,
    smtpPort: 0,
    database: "frostfold_bench",
    freshDatabase: true,
    logLevel: "warn",
    log: () => {},
  });
  try {
    const origin = stack.origin;
    const user = DEMO_USERS.find((u) => u.role === "technician")!;
    const signIn = await fetch(`${origin}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json", origin }, body: JSON.stringify({ email: user.email, password: DEMO_PASSWORD }) });
    const cookie = (signIn.headers.get("set-cookie") ?? "").split(";")[0];
    const headers = { cookie, origin };
    const designs = (await (await fetch(`${origin}/api/designs`, { headers })).json()) as { designs: { id: string; name: string; latestRevision: number }[] };
    const dewar = designs.designs.find((d) => d.name.includes("nitrogen storage dewar"))!;
    const created = await fetch(`${origin}/api/boil-off-tests`, {
      method: "POST",
      headers: { ...headers, "content-type": "application/json" },
      body: JSON.stringify({ designId: dewar.id, revision: dewar.latestRevision, method: "weighing", vesselLabel: "Benchmark dewar" }),
    });
    const test = (await created.json()) as { id: string; predictedHeatLeak_W: number };

    // The scale sees 1.1 × the predicted heat leak as vented nitrogen: ṁ = Q·(1 − ρv/ρl)/h_fg
    // (NIST Chemistry WebBook saturation values at 1 atm, as shared/thermal/fluids.ts carries them).
    const t0 = performance.now();
    await writeLog(file, ROWS, -(1.1 * test.predictedHeatLeak_W * (1 - 4.6079 / 806.08)) / 199_180);
    const bytes = (await stat(file)).size;
    console.log(`generated ${(bytes / 1e6).toFixed(1)} MB in ${seconds(performance.now() - t0)}`);

    // The file goes up as a browser's FormData would send it, read from disk as it is sent.
    const form = new FormData();
    form.append("timeColumn", "timestamp");
    form.append("valueColumn", "gross mass (kg)");
    form.append("valueUnit", "kg");
    form.append("pressureColumn", "barometer (hPa)");
    form.append("file", await openAsBlob(file, { type: "text/csv" }), "weighing-1m.csv");
    const upload = await measure(async () => {
      const res = await fetch(`${origin}/api/boil-off-tests/${test.id}/logs`, { method: "POST", headers, body: form });
      return { status: res.status, body: (await res.json()) as { log?: { rows: number }; analysis?: { points: number; window: { start_s: number; end_s: number }; ratio: number } } };
    });
    if (upload.result.status !== 201) throw new Error(`upload answered ${upload.result.status}: ${JSON.stringify(upload.result.body)}`);
    const body = upload.result.body;

    // The chart request: the first call, then the median and slowest of ten.
    const series = async () => {
      const s = performance.now();
      const res = await fetch(`${origin}/api/boil-off-tests/${test.id}/series`, { headers });
      const json = (await res.json()) as { points: unknown[] };
      if (res.status !== 200) throw new Error(`series answered ${res.status}`);
      return { ms: performance.now() - s, points: json.points.length };
    };
    const first = await series();
    const runs: number[] = [];
    for (let i = 0; i < 10; i++) runs.push((await series()).ms);
    runs.sort((a, b) => a - b);

    const raw = await measure(() => rawCsvParse(file));
    const serverParse = await measure(() => parseLoggerFile({ path: file, originalName: "weighing-1m.csv", size: bytes }, { timeColumn: "timestamp", valueColumn: "gross mass (kg)", pressureColumn: "barometer (hPa)", valueFactor: 1 }));

    const rows = body.log!.rows;
    const line = (what: string, m: { ms: number; cpu_ms: number }, count: number) =>
      console.log(`| ${what} | ${seconds(m.ms)} | ${fmt(count / (m.ms / 1000))} rows/s | ${seconds(m.cpu_ms)} |`);
    console.log("");
    console.log("| step | wall | rows per wall second | CPU |");
    console.log("| --- | --- | --- | --- |");
    line("end to end: POST /logs over HTTP (upload, parse, SHA-256, file and series to the S3 fake, MariaDB, fit, chart)", upload, rows);
    line("raw csv-parse on the same file (stream, default options)", raw, raw.result);
    line("the server's parse alone (csv-parse, cell checks, SHA-256, Float64 columns)", serverParse, serverParse.result.rows);
    console.log(`| GET /series, the chart (${first.points} points) | first ${first.ms.toFixed(1)} ms, median of 10 ${runs[5].toFixed(1)} ms, slowest ${runs[9].toFixed(1)} ms | | |`);
    console.log(`\nend to end ${(bytes / 1e6 / (upload.ms / 1000)).toFixed(1)} MB/s; CPU is this one process's (client and server share it); fit: ${fmt(body.analysis!.points)} readings in the suggested window ${fmt(body.analysis!.window.start_s)}–${fmt(body.analysis!.window.end_s)} s, ratio ${body.analysis!.ratio.toFixed(3)} (invented 1.1)`);
  } finally {
    await stack.stop();
    await rm(dir, { recursive: true, force: true });
  }
}

await main();
process.exit(0);
