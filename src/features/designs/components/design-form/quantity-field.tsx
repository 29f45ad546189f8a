import { useFormContext } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { QuantityInput, type QuantityInputProps } from "../../../../components/quantity-input";

/** A quantity of the design form, which reaches its control through the form's context. */
export function QuantityField(props: Omit<QuantityInputProps<DesignContentInput>, "control" | "id">) {
  const { control } = useFormContext<DesignContentInput>();
  return <QuantityInput control={control} {...props} />;
}
