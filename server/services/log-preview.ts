import {
  PREVIEW_ROWS,
  type LogPreview,
  type PressureUnit,
  type TestMethod,
  type TimeFormat,
  type ValueUnit,
} from "../../shared/schemas/boil-off-test";
import { headRecords, isoCell, logRejected, numberCell, readHead, type Delimiter } from "./log-csv";
import type { UploadedFile } from "./logger-files";

/**
 * The column-mapping step: the header, the first rows, and a guess at the time, value and
 * pressure columns and their units, from the header's names first and the cells' content
 * second. A guess only: the technician confirms or changes it before the upload.
 */
export async function previewLoggerFile(file: UploadedFile, method: TestMethod): Promise<LogPreview> {
  const { text, delimiter } = await readHead(file.path, file.size);
  const records = headRecords(text, delimiter, PREVIEW_ROWS + 1);
  const header = records[0] ?? [];
  if (header.length === 0) throw logRejected([{ line: 1, message: "the file has no header line" }]);
  const rows = records.slice(1);
  if (rows.length === 0) throw logRejected([{ line: 1, message: "the file has a header but no readings below it" }]);

  const columns = header.map((name, i) => ({ name, i, cells: rows.map((r) => r[i] ?? "") }));
  const time = detectTime(columns, delimiter);
  const rest = columns.filter((c) => c.i !== time?.i && isNumeric(c.cells, delimiter));
  const pressure = rest.find((c) => PRESSURE_NAME.test(c.name)) ?? null;
  const candidates = rest.filter((c) => c !== pressure);
  const value = candidates.find((c) => VALUE_NAME[method].test(c.name)) ?? candidates[0] ?? null;
  return {
    header,
    rows,
    delimiter,
    detected: {
      timeColumn: time?.name ?? null,
      timeFormat: time?.format ?? null,
      valueColumn: value?.name ?? null,
      valueUnit: value ? valueUnitOf(value.name, method) : null,
      pressureColumn: pressure?.name ?? null,
      pressureUnit: pressure ? pressureUnitOf(pressure.name, pressure.cells, delimiter) : null,
    },
  };
}

type Column = { name: string; i: number; cells: string[] };

const TIME_NAME = /time|date|stamp|elapsed|clock|^t$|^t[ _([]|sec/i;
const PRESSURE_NAME = /press|baro|atm|p_?amb|ambient p/i;
const VALUE_NAME: Record<TestMethod, RegExp> = {
  weighing: /mass|weight|scale|kg|\bg\b|lb/i,
  "vent-flow": /flow|slpm|scfh|l\/min|ft3|ft³/i,
  level: /level|height|fill|%|mm/i,
};

const isNumeric = (cells: string[], d: Delimiter) => cells.length > 0 && cells.every((c) => Number.isFinite(numberCell(c, d)));
const increasing = (xs: number[]) => xs.every((x, i) => i === 0 || x > xs[i - 1]);

function detectTime(columns: Column[], d: Delimiter): (Column & { format: TimeFormat }) | null {
  const judged = columns.map((c) => {
    const iso = c.cells.map(isoCell);
    if (iso.every(Number.isFinite) && increasing(iso)) return { ...c, format: "iso" as const };
    const secs = c.cells.map((x) => numberCell(x, d));
    if (secs.every(Number.isFinite) && increasing(secs)) return { ...c, format: "seconds" as const };
    return null;
  });
  const usable = judged.filter((c): c is Column & { format: TimeFormat } => c !== null);
  // A named time column first, then any ISO column, then the first increasing one.
  return usable.find((c) => TIME_NAME.test(c.name)) ?? usable.find((c) => c.format === "iso") ?? usable[0] ?? null;
}

function valueUnitOf(name: string, method: TestMethod): ValueUnit | null {
  const n = name.toLowerCase();
  if (method === "weighing") return /\bkg\b|kilo/.test(n) ? "kg" : /\blbs?\b|pound/.test(n) ? "lb" : /\bg\b|gram/.test(n) ? "g" : null;
  if (method === "vent-flow") return /ft3|ft³|scfh|cfh/.test(n) ? "standard-ft3/h" : /l\/min|slpm|lpm|l_min/.test(n) ? "standard-L/min" : null;
  return /%|percent|pct/.test(n) ? "percent" : /\bmm\b/.test(n) ? "mm" : null;
}

export function pressureUnitOf(name: string, cells: string[], d: Delimiter): PressureUnit | null {
  const n = name.toLowerCase();
  for (const unit of ["hpa", "kpa", "mbar", "torr", "psi", "pa"] as const) {
    if (new RegExp(`\\b${unit}\\b`).test(n)) return ({ hpa: "hPa", kpa: "kPa", mbar: "mbar", torr: "torr", psi: "psi", pa: "Pa" } as const)[unit];
  }
  // No unit in the name: an atmosphere's size in each unit tells them apart.
  const first = numberCell(cells[0] ?? "", d);
  if (!Number.isFinite(first)) return null;
  if (first > 50_000) return "Pa";
  if (first > 850) return "hPa";
  if (first > 500) return "torr";
  if (first > 50) return "kPa";
  if (first > 7) return "psi";
  return null;
}
