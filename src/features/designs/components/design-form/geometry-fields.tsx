import { useFormContext, useWatch } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { SelectField } from "../../../../components/ui/field";
import { FormSection } from "./form-section";
import { QuantityField } from "./quantity-field";

type Geometry = DesignContentInput["geometry"];

// Switching shape keeps the radii the user already typed, so trying a sphere loses nothing.
function reshape(kind: Geometry["kind"], from: Geometry): Geometry {
  const cold = from.kind === "planar" ? 0.25 : from.coldRadius_m;
  const warm = from.kind === "planar" ? 0.3 : from.warmRadius_m;
  if (kind === "planar") return { kind, area_m2: from.kind === "planar" ? from.area_m2 : Number((2 * Math.PI * warm).toPrecision(3)) };
  if (kind === "sphere") return { kind, coldRadius_m: cold, warmRadius_m: warm };
  return { kind, coldRadius_m: cold, warmRadius_m: warm, length_m: 1, flatEnds: 2 };
}

export function GeometryFields() {
  const { control, setValue, getValues, register, formState } = useFormContext<DesignContentInput>();
  const kind = useWatch({ control, name: "geometry.kind" });
  const flatEndsError = (formState.errors.geometry as { flatEnds?: { message?: string } } | undefined)?.flatEnds?.message;

  return (
    <FormSection title="Vessel" description="The insulated wall between the warm vacuum jacket and the cold vessel. Curved walls are concentric, the cold one inside.">
      <SelectField
        label="Shape"
        value={kind}
        onChange={(event) => setValue("geometry", reshape(event.target.value as Geometry["kind"], getValues("geometry")), { shouldValidate: true, shouldDirty: true })}
      >
        <option value="cylinder">Cylinder (concentric walls)</option>
        <option value="sphere">Sphere (concentric walls)</option>
        <option value="planar">Flat panel</option>
      </SelectField>
      {kind === "planar" ? (
        <QuantityField name="geometry.area_m2" label="Panel area" kind="area" />
      ) : (
        <div className="grid gap-4 sm:grid-cols-2">
          <QuantityField name="geometry.coldRadius_m" label="Cold vessel radius" kind="length" />
          <QuantityField name="geometry.warmRadius_m" label="Warm wall radius" kind="length" />
          {kind === "cylinder" ? (
            <>
              <QuantityField name="geometry.length_m" label="Length" kind="length" />
              <SelectField label="Flat ends" hint="Each end is a flat disc of the cold radius with the same layup." error={flatEndsError} {...register("geometry.flatEnds", { valueAsNumber: true })}>
                <option value={0}>None (lateral wall only)</option>
                <option value={1}>One</option>
                <option value={2}>Two</option>
              </SelectField>
            </>
          ) : null}
        </div>
      )}
    </FormSection>
  );
}
