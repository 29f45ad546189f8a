import { useState } from "react";
import type { MaterialVersion } from "../../../../shared/schemas/material";
import { ChangesTable } from "../../../components/ui/changes-table";
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
        <ChangesTable
          caption={`Fields changed from version ${a.version} to version ${b.version}`}
          fromLabel={`Version ${a.version}`}
          toLabel={`Version ${b.version}`}
          changes={changes.map((c) => ({ key: c.field, ...c }))}
        />
      )}
    </div>
  );
}
