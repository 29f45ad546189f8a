import { useState } from "react";
import type { RevisionDetail, RevisionSummary } from "../../../../../shared/schemas/design";
import type { UnitSystem } from "../../../../../shared/units";
import { ErrorMessage } from "../../../../components/errors/error-message";
import { ChangesTable } from "../../../../components/ui/changes-table";
import { SelectField } from "../../../../components/ui/field";
import { Loading } from "../../../../components/ui/spinner";
import { formatQuantity } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";
import { useRevision } from "../../api/get-revision";
import { diffContent, kindOfPath, readablePath } from "../../lib/content-diff";

function show(value: unknown, path: string, names: Map<string, string>, system: UnitSystem): string {
  if (value === undefined) return "(not set)";
  if (value === null) return "none";
  if (typeof value === "object" && "materialId" in value) {
    const ref = value as { materialId: string; version: number };
    return `${names.get(`${ref.materialId}@${ref.version}`) ?? ref.materialId} (v${ref.version})`;
  }
  const kind = kindOfPath(path);
  if (typeof value === "number" && kind) return formatQuantity(kind, value, system, 5);
  return String(value);
}

function Changes({ before, after }: { before: RevisionDetail; after: RevisionDetail }) {
  const system = useUnitSystem();
  const names = new Map([...before.materials, ...after.materials].map((m) => [`${m.materialId}@${m.version}`, m.name]));
  const changes = diffContent(before.content, after.content);
  if (changes.length === 0) return <p className="text-sm text-ink-300">The two revisions have the same inputs.</p>;
  return (
    <ChangesTable
      caption={`Inputs changed from revision ${before.revision} to revision ${after.revision}`}
      fromLabel={`Revision ${before.revision}`}
      toLabel={`Revision ${after.revision}`}
      changes={changes.map((c) => ({ key: c.path, field: readablePath(c.path), from: show(c.before, c.path, names, system), to: show(c.after, c.path, names, system) }))}
    />
  );
}

/** "What changed between two": any two revisions, their inputs field by field, old → new. */
export function RevisionDiff({ designId, revisions, shown }: { designId: string; revisions: RevisionSummary[]; shown: number }) {
  const older = revisions.find((r) => r.revision < shown)?.revision ?? revisions.at(-1)?.revision ?? shown;
  const [from, setFrom] = useState(older);
  const [to, setTo] = useState(shown);
  const a = useRevision(designId, from);
  const b = useRevision(designId, to);
  const pick = (label: string, value: number, set: (n: number) => void) => (
    <SelectField label={label} value={value} onChange={(e) => set(Number(e.target.value))}>
      {revisions.map((r) => (
        <option key={r.revision} value={r.revision}>
          Revision {r.revision}{r.changeNote ? ` — ${r.changeNote.slice(0, 40)}` : ""}
        </option>
      ))}
    </SelectField>
  );

  if (revisions.length < 2) return <p className="text-sm text-ink-300">Only one revision so far: save another to compare them.</p>;
  return (
    <div className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-2">
        {pick("From revision", from, setFrom)}
        {pick("To revision", to, setTo)}
      </div>
      {a.error || b.error ? <ErrorMessage error={a.error ?? b.error} title="Could not load a revision" /> : null}
      {a.isPending || b.isPending ? <Loading label="Loading the two revisions…" /> : null}
      {a.data && b.data ? <Changes before={a.data} after={b.data} /> : null}
    </div>
  );
}
