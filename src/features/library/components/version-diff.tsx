import { useState } from "react";
import type { MaterialVersion } from "../../../../shared/schemas/material";
import { SelectField } from "../../../components/ui/field";
import { diffVersions } from "../utils/diff-versions";

/** Pick two versions and list every field that differs, old → new. Starts with the two newest. */
export function VersionDiff({ versions }: { versions: MaterialVersion[] }) {
  const [from, setFrom] = useState(versions[1]?.version ?? versions[0].version);
  const [to, setTo] = useState(versions[0].version);
  if (versions.length < 2) return <p className="text-sm text-ink-300">Only one version so far: nothing to compare yet.</p>;

  const a = versions.find((v) => v.version === from) ?? versions[1];
  const b = versions.find((v) => v.version === to) ?? versions[0];
  const changes = diffVersions(a, b);
  const options = versions.map((v) => (
    <option key={v.version} value={v.version}>
      Version {v.version} ({v.status})
    </option>
  ));

  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="From version" value={from} onChange={(e) => setFrom(Number(e.target.value))}>
          {options}
        </SelectField>
        <SelectField label="To version" value={to} onChange={(e) => setTo(Number(e.target.value))}>
          {options}
        </SelectField>
      </div>
      {a.version === b.version ? (
        <p className="text-sm text-ink-300">Pick two different versions.</p>
      ) : changes.length === 0 ? (
        <p className="text-sm text-ink-300">
          Versions {a.version} and {b.version} carry the same values.
        </p>
      ) : (
        <table className="w-full text-sm">
          <caption className="sr-only">
            Fields changed from version {a.version} to version {b.version}
          </caption>
          <thead>
            <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
              <th scope="col" className="pb-2 pr-4 font-medium">Field</th>
              <th scope="col" className="pb-2 pr-4 font-medium">Version {a.version}</th>
              <th scope="col" className="pb-2 font-medium">Version {b.version}</th>
            </tr>
          </thead>
          <tbody>
            {changes.map((c) => (
              <tr key={c.field} className="border-t border-ink-800 align-top">
                <th scope="row" className="py-2 pr-4 text-left font-mono text-xs font-normal text-ink-200">{c.field}</th>
                <td className="py-2 pr-4 text-ink-300 line-through decoration-ink-500">{c.from}</td>
                <td className="py-2 text-ink-50">
                  <span aria-hidden="true">→ </span>
                  {c.to}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
