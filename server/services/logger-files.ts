import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { Transform, Writable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { parse, type Parser } from "csv-parse";
import { BAROMETRIC_RANGE_PA, MINIMUM_LOG_READINGS, PRESSURE_UNIT_IDS, PRESSURE_UNITS, type PressureUnit, type TimeFormat } from "../../shared/schemas/boil-off-test";
import { csvOptions, describeCell, isoCell, lineAt, LogAbort, logRejected, numberCell, readHead, type LogProblem } from "./log-csv";
import { pressureUnitOf } from "./log-preview";

/**
 * Reads a whole logger CSV as a stream: one pass hashes the bytes, parses each record as
 * csv-parse finds it (so no record objects pile up) and fills growable Float64 columns. The
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
  /** Read from the first reading when left out. */
  timeFormat?: TimeFormat;
  /** reading × valueFactor = the series unit (kg, standard L/min, %). */
  valueFactor: number;
  /** Read from the column's name or its first reading when left out. */
  pressureUnit?: PressureUnit;
}

export interface ParsedLog {
  time: Float64Array;
  value: Float64Array;
  pressure: Float64Array | null;
  rows: number;
  firstReadingAt: Date | null;
  sha256: string;
  /** The formats used: as given, or as read from the file. */
  timeFormat: TimeFormat;
  pressureUnit: PressureUnit | null;
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

  let timeFormat = mapping.timeFormat;
  let pressureUnit = mapping.pressureUnit ?? null;
  let pressureFactor = pressureUnit ? PRESSURE_UNITS[pressureUnit] : NaN;
  let header: string[] = [];
  let lastRecordLine = 0;

  const onRecord = (record: string[], line: number) => {
    lastRecordLine = line;
    if (index === null) {
      headerLine = line;
      header = record;
      index = findColumns(record, mapping, line);
      return;
    }
    const need = Math.max(index.time, index.value, index.pressure) + 1;
    if (record.length < need) {
      problem({ line, message: `this line has ${record.length} cell${record.length === 1 ? "" : "s"}, the header ${need} or more` });
      return;
    }
    const timeCell = record[index.time];
    if (timeFormat === undefined) timeFormat = detectTimeFormat(timeCell, delimiter, line, mapping.timeColumn);
    if (pressure && pressureUnit === null) {
      pressureUnit = pressureUnitOf(header[index.pressure], [record[index.pressure]], delimiter);
      if (pressureUnit === null) {
        throw new LogAbort([{ line, column: "pressureUnit", message: `pressureUnit cannot be read from the column "${header[index.pressure]}" or its first reading (${describeCell(record[index.pressure])}): send pressureUnit, one of ${PRESSURE_UNIT_IDS.join(", ")}` }]);
      }
      pressureFactor = PRESSURE_UNITS[pressureUnit];
    }
    let t: number;
    if (timeFormat === "seconds") t = numberCell(timeCell, delimiter);
    else {
      const epoch = isoCell(timeCell);
      if (Number.isNaN(firstEpoch_ms) && Number.isFinite(epoch)) firstEpoch_ms = epoch;
      t = (epoch - firstEpoch_ms) / 1000;
    }
    const v = numberCell(record[index.value], delimiter) * mapping.valueFactor;
    let ok = true;
    if (!Number.isFinite(t)) {
      ok = false;
      const want = timeFormat === "seconds" ? "elapsed seconds (a number)" : "an ISO 8601 time such as 2026-03-01T14:05:00Z";
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
      p = numberCell(record[index.pressure], delimiter) * pressureFactor;
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
    return;
  };

  const tap = new Transform({
    transform(chunk: Buffer, _encoding, callback) {
      hash.update(chunk);
      const nul = chunk.indexOf(0);
      if (nul >= 0) {
        const at = bytesSeen + nul;
        // info.lines is the line the parser is on; the chunk's line ends before the NUL add to it.
        return callback(new LogAbort([{ line: parser.info.lines + lineAt(chunk, nul) - 1, message: `this is not a text CSV file (binary data at byte ${at}); export the logger's data as CSV` }]));
      }
      bytesSeen += chunk.length;
      callback(null, chunk);
    },
  });
  const parser = recordsWithLines(parse(csvOptions(delimiter)), onRecord);
  const sink = new Writable({ objectMode: true, write: (_record, _encoding, callback) => callback(new Error("csv-parse passed a record around the line-number hook")) });
  try {
    await pipeline(createReadStream(file.path, { highWaterMark: 1 << 20 }), tap, parser, sink);
  } catch (error) {
    if (error instanceof LogAbort) throw logRejected(error.problems, extraProblems);
    const csv = error as { code?: string; lines?: number; message: string };
    // csv-parse reports an unclosed quote at the end of the file; it opened on the line after the last whole record.
    if (csv.code === "CSV_QUOTE_NOT_CLOSED") throw logRejected([{ line: lastRecordLine + 1, message: "a quote (\") opens on this line and is never closed, so the rest of the file cannot be read" }]);
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
    timeFormat: timeFormat ?? "seconds",
    pressureUnit,
  };
}

/** The first reading's time cell decides: an ISO 8601 time, else elapsed seconds. */
function detectTimeFormat(cell: string, delimiter: Parameters<typeof numberCell>[1], line: number, column: string): TimeFormat {
  if (Number.isFinite(isoCell(cell))) return "iso";
  if (Number.isFinite(numberCell(cell, delimiter))) return "seconds";
  throw new LogAbort([{ line, column, message: `${column} must be an ISO 8601 time such as 2026-03-01T14:05:00Z or elapsed seconds (got ${describeCell(cell)})` }]);
}

/**
 * Hands each record to `onRecord` with its line number, synchronously, as csv-parse finds it.
 * csv-parse's own on_record option does this too but builds an info object for every record,
 * which doubled the parse's time on a 1,000,000-row log; its stream instead pushes each record
 * while `info.lines` is still that record's line, so taking the records at push() gives the same
 * line for free. Records never reach the readable side (the sink refuses any that would, so a
 * csv-parse that stopped pushing this way fails loudly in the tests instead of losing lines).
 */
function recordsWithLines(parser: Parser, onRecord: (record: string[], line: number) => void): Parser {
  const push = parser.push.bind(parser);
  let failed = false;
  parser.push = (record: unknown) => {
    if (record === null) return push(null);
    if (failed) return false;
    try {
      onRecord(record as string[], parser.info.lines);
    } catch (error) {
      // Like an on_record that throws: the parse stops and the pipeline rejects with this error.
      failed = true;
      parser.destroy(error as Error);
      return false;
    }
    return true;
  };
  return parser;
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
