import { useFormContext } from "react-hook-form";
import { GASES, type DesignContentInput } from "../../../../../shared/schemas/design";
import { SelectField } from "../../../../components/ui/field";
import { FormSection } from "./form-section";
import { QuantityField } from "./quantity-field";

export function VacuumFields() {
  const { register, formState } = useFormContext<DesignContentInput>();
  return (
    <FormSection title="Vacuum and target" description="Residual gas conducts between layers; below about 10⁻³ Pa its share is small.">
      <div className="grid gap-4 sm:grid-cols-2">
        <QuantityField name="vacuum.pressure_Pa" label="Vacuum pressure" kind="pressure" />
        <SelectField label="Residual gas" error={formState.errors.vacuum?.gas?.message} {...register("vacuum.gas")}>
          {GASES.map((gas) => (
            <option key={gas} value={gas}>
              {gas}
            </option>
          ))}
        </SelectField>
        <QuantityField
          name="targetColdHeat_W"
          label="Target heat into the cold vessel"
          kind="heat"
          empty={null}
          hint="Optional; the layer-count sweep marks the fewest layers that meet it."
        />
      </div>
    </FormSection>
  );
}
