import { useFormContext, useWatch } from "react-hook-form";
import { EmissivityModelFields } from "./emissivity-model-fields";
import type { MaterialFormValues, SpecPath } from "./form-values";

/** A surface's emissivity: its model, and an optional low/high band for the uncertainty. */
export function FaceFields({ path, label }: { path: SpecPath; label: string }) {
  const { register, control } = useFormContext<MaterialFormValues>();
  const banded = useWatch({ control, name: `${path}.banded` });
  return (
    <div className="space-y-3">
      <EmissivityModelFields path={`${path}.model`} label={label} />
      <label className="flex items-center gap-2 text-sm text-ink-100">
        <input type="checkbox" className="accent-frost-400" {...register(`${path}.banded`)} />
        Give a low and high band for {label.toLowerCase()} (uncertainty)
      </label>
      {banded ? (
        <div className="grid gap-3 lg:grid-cols-2">
          <EmissivityModelFields path={`${path}.low`} label={`${label}, low band`} />
          <EmissivityModelFields path={`${path}.high`} label={`${label}, high band`} />
        </div>
      ) : null}
    </div>
  );
}
