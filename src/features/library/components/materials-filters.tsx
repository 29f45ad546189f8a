import { useEffect, useState } from "react";
import { MATERIAL_KINDS, MATERIAL_STATUSES, type MaterialListQuery } from "../../../../shared/schemas/material";
import { SelectField, TextField } from "../../../components/ui/field";
import { KIND_LABELS, SCOPE_LABELS } from "../utils/library-text";
import { STATUS_WORDS } from "./status-label";

type Props = { filters: MaterialListQuery; onChange: (filters: MaterialListQuery) => void };

const SEARCH_DELAY_MS = 300;

/** Kind, status, scope and a name search. Typing waits a moment so each key is not a request. */
export function MaterialsFilters({ filters, onChange }: Props) {
  const [q, setQ] = useState(filters.q ?? "");
  useEffect(() => {
    if (q.trim() === (filters.q ?? "")) return;
    const timer = setTimeout(() => onChange({ ...filters, q: q.trim() || undefined }), SEARCH_DELAY_MS);
    return () => clearTimeout(timer);
  }, [q, filters, onChange]);

  const pick = (key: "kind" | "status" | "scope") => (event: React.ChangeEvent<HTMLSelectElement>) =>
    onChange({ ...filters, [key]: event.target.value || undefined });

  return (
    <form role="search" aria-label="Filter the library" className="grid gap-3 sm:grid-cols-4" onSubmit={(e) => e.preventDefault()}>
      <TextField label="Search by name" type="search" value={q} maxLength={100} onChange={(e) => setQ(e.target.value)} />
      <SelectField label="Kind" value={filters.kind ?? ""} onChange={pick("kind")}>
        <option value="">All kinds</option>
        {MATERIAL_KINDS.map((k) => (
          <option key={k} value={k}>{KIND_LABELS[k]}</option>
        ))}
      </SelectField>
      <SelectField label="Status" value={filters.status ?? ""} onChange={pick("status")}>
        <option value="">Any status</option>
        {MATERIAL_STATUSES.map((s) => (
          <option key={s} value={s}>{STATUS_WORDS[s]}</option>
        ))}
      </SelectField>
      <SelectField label="Scope" value={filters.scope ?? ""} onChange={pick("scope")}>
        <option value="">Seed and ours</option>
        <option value="seed">{SCOPE_LABELS.seed}</option>
        <option value="organization">{SCOPE_LABELS.organization}</option>
      </SelectField>
    </form>
  );
}
