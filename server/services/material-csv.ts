import { CsvError, parse } from "csv-parse/sync";
import type { FieldIssue } from "../../shared/schemas/common";
import {
  MATERIAL_CSV_COLUMNS,
  MATERIAL_CSV_MAX_ROWS,
  MATERIAL_CSV_REQUIRED_COLUMNS,
  MaterialVersionInputSchema,
  type ImportPreview,
  type ImportResult,
  type MaterialCsvColumn,
  type MaterialListQuery,
  type MaterialSource,
  type MaterialVersionInput,
} from "../../shared/schemas/material";
import { insertAuditEntry } from "../db/repositories/audit";
import * as repo from "../db/repositories/materials";
import { AppError } from "../errors";
import type { Actor, ServiceContext } from "./context";
import { newEntryRows } from "./materials";
import { isDuplicateKey } from "./auth";

// The column format is documented once, beside MATERIAL_CSV_COLUMNS in shared/schemas/material.ts.

const TEXT_COLUMNS = new Set<MaterialCsvColumn>(["name", "source_author", "source_title", "source_location", "source_test", "source_note", "change_note"]);
// A spreadsheet runs a cell that starts with one of these as a formula (CSV injection).
const FORMULA_START = /^[=+\-@\t\r]/;

export async function exportMaterialsCsv(ctx: ServiceContext, actor: Actor, filter: MaterialListQuery): Promise<string> {
  const rows = await repo.listMaterials(ctx.db, actor.organizationId, filter);
  const lines = [MATERIAL_CSV_COLUMNS.join(",")];
  for (const { material, version: v } of rows) {
    const { kind, ...properties } = v.properties;
    const cells: Record<MaterialCsvColumn, string | number | null> = {
      kind,
      name: v.name,
      valid_min_K: v.validMinK,
      valid_max_K: v.validMaxK,
      properties: JSON.stringify(properties),
      thickness_m: v.thicknessM,
      areal_mass_kg_per_m2: v.arealMassKgPerM2,
      cost_per_m2: v.costPerM2,
      ...sourceCells(v.source),
      change_note: v.changeNote,
      status: material.status,
      version: v.version,
      scope: material.organizationId === null ? "seed" : "organization",
    };
    lines.push(MATERIAL_CSV_COLUMNS.map((c) => csvCell(cells[c], TEXT_COLUMNS.has(c))).join(","));
  }
  return `${lines.join("\r\n")}\r\n`;
}

function sourceCells(s: MaterialSource) {
  const empty = { source_author: null, source_title: null, source_year: null, source_location: null, source_from_memory: null, source_test: null, source_note: s.note ?? null };
  if (s.type === "citation") {
    return { ...empty, source_type: s.type, source_author: s.author, source_title: s.title, source_year: s.year ?? null, source_location: s.location ?? null, source_from_memory: s.fromMemory ? "yes" : "no" };
  }
  if (s.type === "measured") return { ...empty, source_type: s.type, source_test: s.test };
  return { ...empty, source_type: s.type };
}

function csvCell(value: string | number | null, text: boolean): string {
  if (value === null) return "";
  let s = String(value);
  if (text && FORMULA_START.test(s)) s = `'${s}`;
  return /[",\r\n]|^\s|\s$/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

// ── Import ─────────────────────────────────────────────────────────────────────────────────

interface RowProblem {
  column: string;
  message: string;
}
interface ParsedRow {
  line: number;
  input: MaterialVersionInput | null;
  kind: string | null;
  name: string | null;
  problems: RowProblem[];
}

const csvRejected = (problems: { line: number; column?: string; message: string }[]) => {
  const fields: FieldIssue[] = problems.map((p) => ({ path: p.column ? `line ${p.line}, ${p.column}` : `line ${p.line}`, message: `line ${p.line}: ${p.message}` }));
  const shown = fields.slice(0, 5).map((f) => f.message).join("; ");
  const more = fields.length > 5 ? `; and ${fields.length - 5} more` : "";
  return new AppError(400, "invalid_csv", `The file was not imported (${fields.length} problem${fields.length === 1 ? "" : "s"}): ${shown}${more}. Nothing was changed.`, fields);
};

/**
 * Checks every row against the same schema as the API. A dry run returns the preview; otherwise
 * all rows go in one transaction, and only when every row is valid.
 */
export async function importMaterialsCsv(ctx: ServiceContext, actor: Actor, buffer: Buffer, dryRun: boolean): Promise<{ preview: ImportPreview } | { result: ImportResult }> {
  const rows = readRows(buffer);
  await markTakenNames(ctx, actor, rows);
  const preview: ImportPreview = {
    valid: rows.every((r) => r.problems.length === 0),
    rowCount: rows.length,
    rows: rows.map((r) => ({ line: r.line, kind: r.kind, name: r.name, problems: r.problems })),
  };
  if (dryRun) return { preview };
  if (!preview.valid) throw csvRejected(rows.flatMap((r) => r.problems.map((p) => ({ line: r.line, ...p }))));

  const now = ctx.clock();
  const created = rows.map((r) => newEntryRows(actor, r.input!, now, { changeNote: r.input!.changeNote || "Imported from CSV" }));
  try {
    await ctx.db.transaction(async (tx) => {
      await repo.insertMaterials(tx, actor.organizationId, created.map((c) => c.material));
      await repo.insertVersions(tx, actor.organizationId, created.map((c) => c.version));
      for (const c of created) {
        await insertAuditEntry(tx, actor.organizationId, { actorUserId: actor.userId, action: "material.import", entityType: "material", entityId: c.id, detail: { version: 1, name: c.material.name } }, now);
      }
    });
  } catch (error) {
    // Another request took a name between the check and the insert.
    if (isDuplicateKey(error)) throw new AppError(409, "name_taken", "A name in the file was taken while importing. Check the preview again; nothing was changed.");
    throw error;
  }
  ctx.libraryCache.changed();
  return { result: { imported: created.length, materials: created.map((c) => ({ id: c.id, name: c.material.name })) } };
}

function readRows(buffer: Buffer): ParsedRow[] {
  const fileProblem = (line: number, message: string) => csvRejected([{ line, message }]);
  const columnsHint = `the header must name at least ${MATERIAL_CSV_REQUIRED_COLUMNS.join(", ")}`;
  if (buffer.length === 0) throw fileProblem(1, `the file is empty: ${columnsHint}`);
  const nul = buffer.indexOf(0);
  if (nul >= 0) throw fileProblem(lineAt(buffer, nul), `this is not a text CSV file (binary data at byte ${nul})`);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(buffer);
  } catch {
    throw fileProblem(1, "this is not a UTF-8 text CSV file: save it as CSV UTF-8 and try again");
  }
  text = text.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");
  if (text.trim() === "") throw fileProblem(1, `the file is empty: ${columnsHint}`);

  let records: { record: string[]; info: { lines: number } }[];
  try {
    // With info: true each record comes with where it ended; the typings only know plain rows.
    records = parse(text, { info: true, skip_empty_lines: true }) as unknown as typeof records;
  } catch (error) {
    if (error instanceof CsvError) {
      const line = Number((error as unknown as { lines?: number }).lines ?? 1);
      throw fileProblem(line, error.code === "CSV_RECORD_INCONSISTENT_FIELDS_LENGTH" ? `this line has a different number of cells than the header (${error.message})` : `the CSV cannot be read: ${error.message}`);
    }
    throw error;
  }
  // info.lines is where a record ends; a quoted cell can span lines.
  const startLine = (r: (typeof records)[number]) => r.info.lines - r.record.reduce((n, cell) => n + (cell.match(/\n/g)?.length ?? 0), 0);

  const header = records[0].record.map((h) => h.trim());
  const headerLine = startLine(records[0]);
  const unknown = header.filter((h) => !(MATERIAL_CSV_COLUMNS as readonly string[]).includes(h));
  if (unknown.length > 0) throw fileProblem(headerLine, `unknown column${unknown.length > 1 ? "s" : ""} ${unknown.map((u) => `"${u}"`).join(", ")}; Frostfold's columns are ${MATERIAL_CSV_COLUMNS.join(", ")}`);
  const repeated = header.filter((h, i) => header.indexOf(h) !== i);
  if (repeated.length > 0) throw fileProblem(headerLine, `column ${repeated.map((u) => `"${u}"`).join(", ")} appears more than once`);
  const missing = MATERIAL_CSV_REQUIRED_COLUMNS.filter((c) => !header.includes(c));
  if (missing.length > 0) throw fileProblem(headerLine, `missing column${missing.length > 1 ? "s" : ""} ${missing.join(", ")}: ${columnsHint}`);
  if (records.length === 1) throw fileProblem(headerLine, "the file has a header but no entries");
  if (records.length - 1 > MATERIAL_CSV_MAX_ROWS) throw fileProblem(startLine(records[MATERIAL_CSV_MAX_ROWS + 1]), `the file has ${records.length - 1} entries; at most ${MATERIAL_CSV_MAX_ROWS} per import`);

  const position = new Map(header.map((h, i) => [h as MaterialCsvColumn, i]));
  const rows = records.slice(1).map((r) => parseRow(startLine(r), (c) => (position.has(c) ? (r.record[position.get(c)!] ?? "").trim() : "")));

  // Names are unique ignoring case, inside the file as in the library.
  const firstLine = new Map<string, number>();
  for (const row of rows) {
    if (!row.name) continue;
    const key = row.name.toLowerCase();
    const first = firstLine.get(key);
    if (first !== undefined) row.problems.push({ column: "name", message: `name "${row.name}" is already used on line ${first} of this file (names are unique, ignoring case)` });
    else firstLine.set(key, row.line);
  }
  return rows;
}

async function markTakenNames(ctx: ServiceContext, actor: Actor, rows: ParsedRow[]) {
  const names = rows.map((r) => r.name).filter((n): n is string => !!n);
  const taken = new Set((await repo.findNamesInUse(ctx.db, actor.organizationId, names)).map((r) => r.name.toLowerCase()));
  for (const row of rows) {
    if (row.name && taken.has(row.name.toLowerCase())) row.problems.push({ column: "name", message: `name "${row.name}" is already used by an entry in the library (names are unique, ignoring case)` });
  }
}

const lineAt = (buffer: Buffer, offset: number) => buffer.subarray(0, offset).filter((b) => b === 0x0a).length + 1;
const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function parseRow(line: number, cell: (c: MaterialCsvColumn) => string): ParsedRow {
  const problems: RowProblem[] = [];
  const text = (c: MaterialCsvColumn) => {
    const s = cell(c);
    return s === "" ? null : /^'[=+\-@\t\r]/.test(s) ? s.slice(1) : s;
  };
  const num = (c: MaterialCsvColumn) => {
    const s = cell(c);
    if (s === "") return null;
    if (!NUMBER.test(s)) {
      problems.push({ column: c, message: `${c} must be a number (got "${s.slice(0, 40)}")` });
      return null;
    }
    return Number(s);
  };
  let properties: Record<string, unknown> = {};
  const json = cell("properties");
  if (json === "") problems.push({ column: "properties", message: "properties is required: the kind's properties as JSON, e.g. {\"form\":\"foil\",...}" });
  else {
    try {
      const parsed: unknown = JSON.parse(json);
      if (parsed === null || typeof parsed !== "object" || Array.isArray(parsed)) problems.push({ column: "properties", message: "properties must be a JSON object such as {\"form\":\"foil\",...}" });
      else properties = parsed as Record<string, unknown>;
    } catch (error) {
      problems.push({ column: "properties", message: `properties is not valid JSON (${(error as Error).message})` });
    }
  }
  const fromMemory = cell("source_from_memory").toLowerCase();
  if (!["", "yes", "no", "true", "false"].includes(fromMemory)) problems.push({ column: "source_from_memory", message: `source_from_memory must be yes or no (got "${fromMemory.slice(0, 20)}")` });
  const sourceType = cell("source_type");
  const source =
    sourceType === "citation"
      ? { type: sourceType, author: text("source_author") ?? undefined, title: text("source_title") ?? undefined, year: num("source_year"), location: text("source_location"), fromMemory: fromMemory === "yes" || fromMemory === "true", note: text("source_note") }
      : sourceType === "measured"
        ? { type: sourceType, test: text("source_test") ?? undefined, note: text("source_note") }
        : { type: sourceType, note: text("source_note") };
  const candidate = {
    name: text("name") ?? undefined,
    properties: { ...properties, kind: cell("kind") },
    validRange_K: { min: num("valid_min_K") ?? undefined, max: num("valid_max_K") ?? undefined },
    thickness_m: num("thickness_m"),
    arealMass_kg_per_m2: num("areal_mass_kg_per_m2"),
    cost_per_m2: num("cost_per_m2"),
    source,
    changeNote: text("change_note"),
  };
  const result = MaterialVersionInputSchema.safeParse(candidate);
  if (!result.success) {
    const already = new Set(problems.map((p) => p.column));
    for (const issue of result.error.issues) {
      const column = columnOf(issue.path);
      if (already.has(column)) continue; // the cell's own problem says it better
      problems.push({ column, message: column === "properties" ? `properties: ${issue.message}` : renameFields(issue.message) });
    }
  }
  return { line, input: result.success && problems.length === 0 ? result.data : null, kind: cell("kind") || null, name: text("name"), problems };
}

// The schema speaks in the API's field names; a CSV user sees column names.
const FIELD_TO_COLUMN: [string, string][] = [
  ["validRange_K.min", "valid_min_K"],
  ["validRange_K.max", "valid_max_K"],
  ["validRange_K", "valid_min_K–valid_max_K"],
  ["properties.kind", "kind"],
  ["arealMass_kg_per_m2", "areal_mass_kg_per_m2"],
  ["source.fromMemory", "source_from_memory"],
  ["source.type", "source_type"],
  ["source.author", "source_author"],
  ["source.title", "source_title"],
  ["source.year", "source_year"],
  ["source.location", "source_location"],
  ["source.test", "source_test"],
  ["source.note", "source_note"],
  ["changeNote", "change_note"],
];
const renameFields = (message: string) => FIELD_TO_COLUMN.reduce((m, [field, column]) => m.split(field).join(column), message);

function columnOf(path: PropertyKey[]): string {
  const [a, b] = path.map(String);
  if (a === "validRange_K") return b === "min" ? "valid_min_K" : b === "max" ? "valid_max_K" : "valid_min_K–valid_max_K";
  if (a === "properties") return b === "kind" || b === undefined ? "kind" : "properties";
  if (a === "source") return b === undefined ? "source_type" : (FIELD_TO_COLUMN.find(([f]) => f === `source.${b}`)?.[1] ?? "source_type");
  if (a === "arealMass_kg_per_m2") return "areal_mass_kg_per_m2";
  if (a === "changeNote") return "change_note";
  return a ?? "row";
}
