import { useFormContext, useWatch } from "react-hook-form";
import { SelectField } from "../../../../components/ui/field";
import { FaceFields } from "./face-fields";
import type { MaterialFormValues } from "./form-values";
import { useErrorOf } from "./use-error-of";

/** A reflector: film or foil, and each face's emissivity (one model when both faces are alike). */
export function ReflectorFields() {
  const { register, control } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const sameFaces = useWatch({ control, name: "properties.sameFaces" });
  return (
    <div className="space-y-4">
      <SelectField label="Form" error={errorOf("properties.form")} {...register("properties.form")}>
        <option value="film">Film (metallized polymer)</option>
        <option value="foil">Foil</option>
      </SelectField>
      <label className="flex items-center gap-2 text-sm text-ink-100">
        <input type="checkbox" className="accent-frost-400" {...register("properties.sameFaces")} />
        Both faces alike (metallized on both sides)
      </label>
      <FaceFields path="properties.warmSide" label={sameFaces ? "Both faces" : "Warm face"} />
      {sameFaces ? null : <FaceFields path="properties.coldSide" label="Cold face" />}
    </div>
  );
}

/** A vessel wall's finish: one surface's emissivity. */
export function WallFinishFields() {
  return <FaceFields path="properties.surface" label="Surface" />;
}
