import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { CreateDesignInputSchema, type DesignDetail } from "../../../../shared/schemas/design";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextField } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { useCreateDesign } from "../api/create-design";
import { markDesignErrors } from "../lib/server-field-errors";
import type { DesignFormApi } from "./design-editor";

const NameSchema = CreateDesignInputSchema.pick({ name: true, vesselLabel: true });
type NameValues = { name: string; vesselLabel?: string };

/** Name and vessel of a new design, and the button that stores its first revision. */
export function CreateDesignBar({ form, onCreated }: { form: DesignFormApi; onCreated: (design: DesignDetail) => unknown }) {
  const create = useCreateDesign();
  const [problem, setProblem] = useState<string | null>(null);
  const names = useForm<NameValues>({ resolver: zodResolver(NameSchema), defaultValues: { name: "", vesselLabel: "" } });

  const onSubmit = names.handleSubmit(async ({ name, vesselLabel }) => {
    setProblem(null);
    if (!(await form.trigger())) return setProblem("Fix the marked fields in the design first: the results panel lists them.");
    await form.handleSubmit(async (content) => {
      try {
        onCreated(await create.mutateAsync({ name, vesselLabel: vesselLabel || undefined, content, changeNote: "First revision" }));
      } catch (error) {
        if (isApiError(error) && error.fields.some((f) => f.path === "name")) names.setError("name", { type: "server", message: error.fields.find((f) => f.path === "name")?.message });
        setProblem(markDesignErrors(error, form.setError, "content.").join(" "));
      }
    })();
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="New design" className="mb-6 space-y-3 rounded-lg border border-ink-700 bg-ink-900 p-4">
      {problem ? <Callout tone="error" title="Not created">{problem}</Callout> : null}
      <div className="grid items-start gap-4 sm:grid-cols-[2fr_2fr_auto]">
        <TextField label="Design name" error={names.formState.errors.name?.message} {...names.register("name")} />
        <TextField label="Vessel (optional)" hint="e.g. the magnet cryostat in lab 2" error={names.formState.errors.vesselLabel?.message} {...names.register("vesselLabel")} />
        <Button type="submit" className="sm:mt-7" busy={names.formState.isSubmitting}>
          Create design
        </Button>
      </div>
    </form>
  );
}
