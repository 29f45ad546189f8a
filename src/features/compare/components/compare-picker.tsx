export const MAX_COMPARED = 6;

export type ComparePick = { designId: string; revision: number | null };
export type CompareOption = { id: string; name: string; latestRevision: number };

/** "a" or "a:3", as GET /api/compare takes them. */
export const pickToId = (p: ComparePick) => (p.revision === null ? p.designId : `${p.designId}:${p.revision}`);
export const idToPick = (id: string): ComparePick => {
  const [designId, rev] = id.split(":");
  return { designId, revision: rev ? Number(rev) : null };
};

type ComparePickerProps = { options: CompareOption[]; picks: ComparePick[]; onChange: (picks: ComparePick[]) => void };

/** Two to six designs, each at its latest revision or a chosen one. */
export function ComparePicker({ options, picks, onChange }: ComparePickerProps) {
  const find = (id: string) => picks.find((p) => p.designId === id);
  const toggle = (id: string) => onChange(find(id) ? picks.filter((p) => p.designId !== id) : [...picks, { designId: id, revision: null }]);
  const setRevision = (id: string, revision: number | null) => onChange(picks.map((p) => (p.designId === id ? { ...p, revision } : p)));

  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium text-ink-100">
        Designs to compare ({picks.length} of at most {MAX_COMPARED}; at least 2)
      </legend>
      <ul className="grid gap-2 sm:grid-cols-2">
        {options.map((o) => {
          const pick = find(o.id);
          return (
            <li key={o.id} className={`flex flex-wrap items-center gap-3 rounded-md border px-3 py-2 ${pick ? "border-frost-600 bg-frost-900/30" : "border-ink-700"}`}>
              <label className="flex flex-1 items-center gap-2 text-sm text-ink-100">
                <input type="checkbox" className="size-4 accent-frost-400" checked={pick !== undefined} disabled={!pick && picks.length >= MAX_COMPARED} onChange={() => toggle(o.id)} />
                {o.name}
              </label>
              {pick ? (
                <select
                  aria-label={`Revision of ${o.name}`}
                  className="rounded-md border border-ink-600 bg-ink-900 px-2 py-1 text-sm text-ink-50"
                  value={pick.revision ?? ""}
                  onChange={(e) => setRevision(o.id, e.target.value === "" ? null : Number(e.target.value))}
                >
                  <option value="">Latest (revision {o.latestRevision})</option>
                  {Array.from({ length: o.latestRevision }, (_, i) => o.latestRevision - i).map((r) => (
                    <option key={r} value={r}>
                      Revision {r}
                    </option>
                  ))}
                </select>
              ) : null}
            </li>
          );
        })}
      </ul>
    </fieldset>
  );
}
