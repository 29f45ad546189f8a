import { open } from "node:fs/promises";
import { parse as parseSync } from "csv-parse/sync";
import type { FieldIssue } from "../../shared/schemas/common";
import { AppError } from "../errors";

/**
 * The low-level pieces of reading a logger CSV, shared by the preview and the streamed parse:
 * the text checks on the file's first bytes, delimiter detection, number and time cells, and
 * the one error that names every bad line.
 */
export interface LogProblem {
  line: number;
  column?: string;
  message: string;
}

/** A file the parse refused; nothing has been stored when this is thrown. */
export function logRejected(problems: LogProblem[], more = 0): AppError {
  const fields: FieldIssue[] = problems.map((p) => ({ path: p.column ? `line ${p.line}, ${p.column}` : `line ${p.line}`, message: `line ${p.line}: ${p.message}` }));
  const shown = fields.slice(0, 5).map((f) => f.message).join("; ");
  const hidden = fields.length - 5 + more;
  const total = fields.length + more;
  return new AppError(400, "invalid_log", `The log was not stored (${total}${more > 0 ? "+" : ""} problem${total === 1 ? "" : "s"}): ${shown}${hidden > 0 ? `; and ${hidden} more` : ""}. Nothing was changed.`, fields);
}

/** Thrown inside the stream to stop reading as soon as the file is known to be refused. */
export class LogAbort extends Error {
  constructor(readonly problems: LogProblem[]) {
    super("log refused");
  }
}

export type Delimiter = "," | ";" | "\t";
const HEAD_BYTES = 256 * 1024;

/** The first bytes of the file as text, after the checks every log must pass. */
export async function readHead(path: string, size: number): Promise<{ text: string; delimiter: Delimiter }> {
  if (size === 0) throw logRejected([{ line: 1, message: "the file is empty: a log needs a header line and readings below it" }]);
  const handle = await open(path, "r");
  let head: Buffer;
  try {
    const buffer = Buffer.alloc(Math.min(size, HEAD_BYTES));
    const { bytesRead } = await handle.read(buffer, 0, buffer.length, 0);
    head = buffer.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
  const nul = head.indexOf(0);
  if (nul >= 0) throw logRejected([{ line: lineAt(head, nul), message: `this is not a text CSV file (binary data at byte ${nul}); export the logger's data as CSV` }]);
  // Cut at the last line end so a multi-byte character split by the read is not mistaken for bad UTF-8.
  const cut = size > head.length ? head.lastIndexOf(0x0a) + 1 || head.length : head.length;
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(head.subarray(0, cut));
  } catch {
    throw logRejected([{ line: 1, message: "this is not a UTF-8 text CSV file: save it as CSV UTF-8 and try again" }]);
  }
  text = text.replace(/^\uFEFF/, "");
  if (text.trim() === "") throw logRejected([{ line: 1, message: "the file holds only blank lines: a log needs a header line and readings below it" }]);
  return { text, delimiter: detectDelimiter(firstDataLine(text)) };
}

export const lineAt = (buffer: Buffer, offset: number) => buffer.subarray(0, offset).filter((b) => b === 0x0a).length + 1;

const firstDataLine = (text: string) => text.split(/\r?\n/).find((l) => l.trim() !== "" && !l.startsWith("#")) ?? "";

/** The separator the header line uses most, outside quotes; a comma when none appears. */
function detectDelimiter(line: string): Delimiter {
  const unquoted = line.replace(/"[^"]*"/g, "");
  const counts: [Delimiter, number][] = [",", ";", "\t"].map((d) => [d as Delimiter, unquoted.split(d).length - 1]);
  counts.sort((a, b) => b[1] - a[1]);
  return counts[0][1] > 0 ? counts[0][0] : ",";
}

/** csv-parse options both readers use: '#' starts a comment line (logger metadata above the header). */
export const csvOptions = (delimiter: Delimiter) => ({
  delimiter,
  bom: true,
  comment: "#",
  comment_no_infix: true,
  skip_empty_lines: true,
  relax_column_count: true,
  trim: true,
});

/** Up to `count` records of the head (header first), for the preview. */
export function headRecords(text: string, delimiter: Delimiter, count: number): string[][] {
  try {
    return parseSync(text, { ...csvOptions(delimiter), to: count }) as string[][];
  } catch (error) {
    const line = Number((error as { lines?: number }).lines ?? 1);
    throw logRejected([{ line, message: `the CSV cannot be read: ${(error as Error).message}` }]);
  }
}

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** A decimal number cell; NaN when it is not one. A decimal comma only when commas do not separate cells. */
export function numberCell(cell: string, delimiter: Delimiter): number {
  const s = delimiter !== "," && cell.includes(",") ? cell.replace(",", ".") : cell;
  return NUMBER.test(s) ? Number(s) : NaN;
}

const ISO = /^(\d{4}-\d{2}-\d{2})[T ](\d{2}:\d{2}(?::\d{2}(?:[.,]\d{1,9})?)?)(Z|[+-]\d{2}:?\d{2})?$/;

/**
 * An ISO 8601 date and time as epoch milliseconds; NaN when it is not one. A time without a zone
 * is read as UTC, so a logger on local time cannot repeat an hour at a daylight-saving change.
 */
export function isoCell(cell: string): number {
  const fast = isoFast(cell);
  if (fast === fast) return fast; // not NaN
  const m = ISO.exec(cell);
  if (!m) return NaN;
  const zone = m[3] === undefined ? "Z" : m[3].length === 5 ? `${m[3].slice(0, 3)}:${m[3].slice(3)}` : m[3];
  return Date.parse(`${m[1]}T${m[2].replace(",", ".")}${zone}`);
}

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const digit = (s: string, i: number) => {
  const d = s.charCodeAt(i) - 48;
  return d >= 0 && d <= 9 ? d : NaN;
};
const two = (s: string, i: number) => digit(s, i) * 10 + digit(s, i + 1);

/**
 * The common logger forms, YYYY-MM-DD[T ]hh:mm:ss[.fff][Z|±hh:mm], read digit by digit (the
 * regular expression and Date.parse took a tenth of a 1,000,000-row parse). NaN for anything
 * else, which then goes the general way, so both ways accept exactly the same cells.
 */
function isoFast(s: string): number {
  const n = s.length;
  if (n < 19 || s.charCodeAt(4) !== 45 || s.charCodeAt(7) !== 45 || s.charCodeAt(13) !== 58 || s.charCodeAt(16) !== 58) return NaN;
  const sep = s.charCodeAt(10);
  if (sep !== 84 && sep !== 32) return NaN; // "T" or " "
  const year = digit(s, 0) * 1000 + digit(s, 1) * 100 + two(s, 2);
  const month = two(s, 5);
  const day = two(s, 8);
  const hour = two(s, 11);
  const minute = two(s, 14);
  const second = two(s, 17);
  // Date.UTC reads years 0–99 as 1900–1999, so those go the general way.
  if (!(year >= 100 && month >= 1 && month <= 12 && day >= 1 && hour <= 23 && minute <= 59 && second <= 59)) return NaN;
  const leap = month === 2 && year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0);
  if (day > DAYS_IN_MONTH[month - 1] + (leap ? 1 : 0)) return NaN;
  let i = 19;
  let ms = 0;
  const mark = s.charCodeAt(i);
  if (mark === 46 || mark === 44) {
    // "." or ","; milliseconds from the first three digits, like Date.parse
    let scale = 100;
    i++;
    const from = i;
    while (i < n && i - from < 9) {
      const d = digit(s, i);
      if (d !== d) break;
      if (scale >= 1) ms += d * scale;
      scale /= 10;
      i++;
    }
    if (i === from) return NaN;
  }
  let offset_min = 0;
  if (i < n) {
    const z = s.charCodeAt(i);
    if (z === 90 && i === n - 1) offset_min = 0; // "Z"
    else if ((z === 43 || z === 45) && (n - i === 6 || n - i === 5)) {
      const oh = two(s, i + 1);
      const om = n - i === 6 ? (s.charCodeAt(i + 3) === 58 ? two(s, i + 4) : NaN) : two(s, i + 3);
      if (!(oh <= 23 && om <= 59)) return NaN;
      offset_min = (z === 43 ? 1 : -1) * (oh * 60 + om);
    } else return NaN;
  }
  return Date.UTC(year, month - 1, day, hour, minute, second, ms) - offset_min * 60_000;
}

export const describeCell = (cell: string) => (cell === "" ? "an empty cell" : `"${cell.slice(0, 40)}"`);
