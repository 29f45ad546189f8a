import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { Transform, Writable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { parse } from "csv-parse";
import { BAROMETRIC_RANGE_PA, MINIMUM_LOG_READINGS, type TimeFormat } from "../../shared/schemas/boil-off-test";
import { csvOptions, describeCell, isoCell, LogAbort, logRejected, numberCell, readHead, type LogProblem } from "./log-csv";

/**
 * Reads a whole logger CSV as a stream: one pass hashes the bytes, parses each record inside
 * csv-parse's on_record (so no record objects pile up) and fills growable Float64 columns. The
 * file is never held in memory; only the numbers are. Every problem names its line.
 */
export interface UploadedFile {
  path: string;
  originalName: string;
  size: number;
}

export interface ColumnMapping {
  timeColumn: string;
  valueColumn: string;
  pressureColumn?: string;
  timeFormat: TimeFormat;
  /** reading × valueFactor = the series unit (kg, standard L/min, %). */
  valueFactor: number;
  /** reading × pressureFactor = Pa. */
  pressureFactor?: number;
}

export interface ParsedLog {
  time: Float64Array;
  value: Float64Array;
  pressure: Float64Array | null;
  rows: number;
  firstReadingAt: Date | null;
  sha256: string;
}

const MAX_PROBLEMS = 20;

class Column {
  data = new Float64Array(4096);
  length = 0;
  push(x: number) {
    if (this.length === this.data.length) {
      const grown = new Float64Array(this.data.length * 2);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[this.length++] = x;
  }
  view() {
    return this.data.subarray(0, this.length);
  }
}

export async function parseLoggerFile(file: UploadedFile, mapping: ColumnMapping): Promise<ParsedLog> {
  const { delimiter } = await readHead(file.path, file.size);
  const hash = createHash("sha256");
  const time = new Column();
  const value = new Column();
  const pressure = mapping.pressureColumn ? new Column() : null;
  const problems: LogProblem[] = [];
  let extraProblems = 0;
  let index: { time: number; value: number; pressure: number } | null = null;
  let headerLine = 1;
  let firstEpoch_ms = NaN;
  let previousTime = -Infinity;
  let previousLine = 0;
  let bytesSeen = 0;

  const problem = (p: LogProblem) => {
    if (problems.length < MAX_PROBLEMS) problems.push(p);
    else extraProblems++;
    // Past a screenful of problems the file is plainly the wrong one: stop reading it.
    if (problems.length + extraProblems >= 200) throw new LogAbort(problems);
  };

  const onRecord = (record: string[], info: { lines: number }) => {
    const line = info.lines;
    if (index === null) {
      headerLine = line;
      index = findColumns(record, mapping, line);
      return null;
    }
    const need = Math.max(index.time, index.value, index.pressure) + 1;
    if (record.length < need) {
      problem({ line, message: `this line has ${record.length} cell${record.length === 1 ? "" : "s"}, the header ${need} or more` });
      return null;
    }
    const timeCell = record[index.time];
    let t: number;
    if (mapping.timeFormat === "seconds") t = numberCell(timeCell, delimiter);
    else {
      const epoch = isoCell(timeCell);
      if (Number.isNaN(firstEpoch_ms) && Number.isFinite(epoch)) firstEpoch_ms = epoch;
      t = (epoch - firstEpoch_ms) / 1000;
    }
    const v = numberCell(record[index.value], delimiter) * mapping.valueFactor;
    let ok = true;
    if (!Number.isFinite(t)) {
      ok = false;
      const want = mapping.timeFormat === "seconds" ? "elapsed seconds (a number)" : "an ISO 8601 time such as 2026-03-01T14:05:00Z";
      problem({ line, column: mapping.timeColumn, message: `${mapping.timeColumn} must be ${want} (got ${describeCell(timeCell)})` });
    } else if (t <= previousTime) {
      ok = false;
      const what = t === previousTime ? "repeats" : "goes back from";
      problem({ line, column: mapping.timeColumn, message: `the time ${what} line ${previousLine}'s (${timeCell}): times must increase line by line` });
    }
    if (!Number.isFinite(v)) {
      ok = false;
      problem({ line, column: mapping.valueColumn, message: `${mapping.valueColumn} must be a number (got ${describeCell(record[index.value])})` });
    }
    let p = NaN;
    if (pressure) {
      p = numberCell(record[index.pressure], delimiter) * mapping.pressureFactor!;
      if (!(p >= BAROMETRIC_RANGE_PA.min && p <= BAROMETRIC_RANGE_PA.max)) {
        ok = false;
        const got = Number.isFinite(p) ? `${(p / 1000).toPrecision(4)} kPa after conversion; check pressureUnit` : `got ${describeCell(record[index.pressure])}`;
        problem({ line, column: mapping.pressureColumn, message: `${mapping.pressureColumn} must be a barometric pressure from ${BAROMETRIC_RANGE_PA.min / 1000} to ${BAROMETRIC_RANGE_PA.max / 1000} kPa (${got})` });
      }
    }
    if (Number.isFinite(t) && t > previousTime) {
      previousTime = t;
      previousLine = line;
    }
    if (ok && problems.length === 0) {
      time.push(t);
      value.push(v);
      pressure?.push(p);
    }
    return null;
  };

  const tap = new Transform({
    transform(chunk: Buffer, _encoding, callback) {
      hash.update(chunk);
      const nul = chunk.indexOf(0);
      if (nul >= 0) {
        const at = bytesSeen + nul;
        return callback(new LogAbort([{ line: parser.info.lines, message: `this is not a text CSV file (binary data at byte ${at}); export the logger's data as CSV` }]));
      }
      bytesSeen += chunk.length;
      callback(null, chunk);
    },
  });
  const parser = parse({ ...csvOptions(delimiter), on_record: onRecord });
  const sink = new Writable({ objectMode: true, write: (_record, _encoding, callback) => callback() });
  try {
    await pipeline(createReadStream(file.path, { highWaterMark: 1 << 20 }), tap, parser, sink);
  } catch (error) {
    if (error instanceof LogAbort) throw logRejected(error.problems, extraProblems);
    const csv = error as { code?: string; lines?: number; message: string };
    if (csv.code?.startsWith("CSV_")) throw logRejected([{ line: Number(csv.lines ?? 1), message: `the CSV cannot be read: ${csv.message}` }]);
    throw error;
  }
  if (problems.length > 0) throw logRejected(problems, extraProblems);
  if (index === null) throw logRejected([{ line: 1, message: "the file has no header line" }]);
  if (time.length === 0) throw logRejected([{ line: headerLine, message: "the file has a header but no readings below it" }]);
  if (time.length < MINIMUM_LOG_READINGS) {
    throw logRejected([{ line: headerLine, message: `the file holds ${time.length} reading${time.length === 1 ? "" : "s"}; a fit needs at least ${MINIMUM_LOG_READINGS}` }]);
  }
  const t = time.view();
  // Elapsed-seconds logs are shifted so the first reading is t = 0, like ISO logs.
  if (t[0] !== 0) {
    const t0 = t[0];
    for (let i = 0; i < t.length; i++) t[i] -= t0;
  }
  return {
    time: t,
    value: value.view(),
    pressure: pressure ? pressure.view() : null,
    rows: time.length,
    firstReadingAt: Number.isNaN(firstEpoch_ms) ? null : new Date(firstEpoch_ms),
    sha256: hash.digest("hex"),
  };
}

/** Header cells matched ignoring case and surrounding spaces. */
function findColumns(header: string[], mapping: ColumnMapping, line: number) {
  const names = header.map((h) => h.trim().toLowerCase());
  const find = (field: string, name: string) => {
    const i = names.indexOf(name.trim().toLowerCase());
    if (i < 0) {
      const listed = header.slice(0, 12).map((h) => `"${h}"`).join(", ");
      throw new LogAbort([{ line, column: field, message: `${field} "${name}" is not a column of the header (its columns: ${listed}${header.length > 12 ? ", …" : ""})` }]);
    }
    return i;
  };
  return {
    time: find("timeColumn", mapping.timeColumn),
    value: find("valueColumn", mapping.valueColumn),
    pressure: mapping.pressureColumn ? find("pressureColumn", mapping.pressureColumn) : -1,
  };
}
