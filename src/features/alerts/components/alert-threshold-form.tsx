import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { ALERT_THRESHOLD_RANGE, AlertSettingsSchema, type AlertSettings } from "../../../../shared/schemas/alert";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { Loading } from "../../../components/ui/spinner";
import { useCan } from "../../../lib/can";
import { formatNumber } from "../../../lib/format-quantity";
import { applyServerErrors } from "../../../lib/form-errors";
import { useAlertSettings, useSaveAlertSettings } from "../api/alert-settings";

// Called with the stored number at first and with the typed text after; empty or words are NaN,
// so the schema's own message (naming the field and its range) is what the owner reads.
const toNumber = (v: unknown) => (typeof v === "number" ? v : typeof v === "string" && v.trim() !== "" ? Number(v.trim().replace(",", ".")) : Number.NaN);

function ThresholdForm({ current }: { current: AlertSettings }) {
  const save = useSaveAlertSettings();
  const form = useForm<AlertSettings>({ resolver: zodResolver(AlertSettingsSchema), defaultValues: current });
  const { register, handleSubmit, setError, formState: { errors, isSubmitting, isDirty } } = form;
  const onSubmit = handleSubmit(async (values) => {
    try {
      const saved = await save.mutateAsync(values);
      form.reset(saved);
    } catch (error) {
      const rest = applyServerErrors(error, setError, ["threshold"]);
      if (rest) setError("root", { message: rest });
    }
  });
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Alert threshold" className="flex flex-wrap items-start gap-3">
      <div className="w-56">
        <TextField
          label="Alert threshold (measured / predicted)"
          inputMode="decimal"
          hint={`From ${ALERT_THRESHOLD_RANGE.min} to ${ALERT_THRESHOLD_RANGE.max}.`}
          error={errors.threshold?.message}
          {...register("threshold", { setValueAs: toNumber })}
        />
      </div>
      <Button type="submit" variant="secondary" className="mt-7" busy={isSubmitting} disabled={!isDirty}>Save threshold</Button>
      {errors.root?.message ? <Callout tone="error">{errors.root.message}</Callout> : null}
      {save.isSuccess && !isDirty ? <p role="status" className="mt-9 text-sm text-moss-300">Saved.</p> : null}
    </form>
  );
}

/**
 * The organization's alert threshold: an accepted test above it e-mails the owners and the
 * design's engineers and shows on Overview. Owners change it; everyone else reads it.
 */
export function AlertThreshold() {
  const settings = useAlertSettings();
  const canEdit = useCan("edit:settings");
  if (settings.isPending) return <Loading label="Loading the alert threshold…" />;
  if (settings.error) return null;
  if (!canEdit) return <p className="text-sm text-ink-200">An accepted test above <span className="font-mono">{formatNumber(settings.data.threshold, 3)}×</span> its prediction raises an alert (owners set this).</p>;
  return <ThresholdForm current={settings.data} />;
}
