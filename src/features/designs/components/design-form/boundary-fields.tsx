import { useFormContext, useWatch } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { refOf } from "../../lib/default-content";
import { FormSection } from "./form-section";
import { useLibrary } from "./library-context";
import { MaterialField } from "./material-field";
import { QuantityField } from "./quantity-field";

export function WarmWallFields() {
  return (
    <FormSection title="Warm wall" description="The inner face of the vacuum jacket.">
      <div className="grid gap-4 sm:grid-cols-2">
        <QuantityField name="warm.temperature_K" label="Warm wall temperature" kind="temperature" />
        <MaterialField name="warm.finish" label="Warm wall finish" kind="wall-finish" />
      </div>
    </FormSection>
  );
}

/** The cold space is held either by a cryogen bath (boil-off and hold time follow) or at a fixed temperature. */
export function ColdSpaceFields() {
  const { control, setValue, getValues } = useFormContext<DesignContentInput>();
  const { picks } = useLibrary();
  const cryogen = useWatch({ control, name: "cold.cryogen" });
  const byCryogen = cryogen != null;
  const opts = { shouldValidate: true, shouldDirty: true } as const;

  const holdBy = (mode: "cryogen" | "fixed") => {
    if (mode === "cryogen" && !byCryogen && picks.cryogen[0]) {
      setValue("cold.cryogen", refOf(picks.cryogen[0]), opts);
      setValue("cold.temperature_K", null, opts);
    }
    if (mode === "fixed" && byCryogen) {
      setValue("cold.cryogen", null, opts);
      setValue("cold.temperature_K", getValues("cold.temperature_K") ?? 4.2, opts);
    }
  };

  return (
    <FormSection title="Cold space" description="The cold vessel's outer wall and what keeps it cold.">
      <div role="radiogroup" aria-label="The cold space is held by" className="flex flex-wrap gap-4 text-sm">
        {(["cryogen", "fixed"] as const).map((mode) => (
          <label key={mode} className="flex items-center gap-2 text-ink-100">
            <input type="radio" name="cold-mode" checked={(mode === "cryogen") === byCryogen} onChange={() => holdBy(mode)} className="accent-frost-400" />
            {mode === "cryogen" ? "A cryogen from the library" : "A fixed temperature"}
          </label>
        ))}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        {byCryogen ? (
          <MaterialField name="cold.cryogen" label="Cryogen" kind="cryogen" hint="Held at its boiling point at 1 atm." />
        ) : (
          <QuantityField name="cold.temperature_K" label="Cold wall temperature" kind="temperature" empty={null} />
        )}
        <MaterialField name="cold.finish" label="Cold wall finish" kind="wall-finish" />
        <QuantityField name="cold.capacity_L" label="Capacity" kind="volume" empty={null} hint="Optional; needed for evaporation rate and hold time." />
        <QuantityField name="cold.fillFraction" label="Fill fraction" kind={null} suffix="0 to 1" hint="Liquid when the hold time starts." />
        <QuantityField name="cold.minimumFraction" label="Minimum fraction" kind={null} suffix="0 to 1" hint="Liquid left when the hold time ends." />
      </div>
    </FormSection>
  );
}
