import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { ApprovalInputSchema } from "../../../../shared/schemas/material";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { TextAreaField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { useDecideMaterial } from "../api/decide-material";

type Values = z.input<typeof ApprovalInputSchema>;

/**
 * An owner's decision on the open draft. Both buttons submit the same form with their decision;
 * the shared schema refuses a rejection without a comment, beside the comment box.
 */
export function DecisionForm({ materialId, draftVersion }: { materialId: string; draftVersion: number }) {
  const decide = useDecideMaterial();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setValue, setError, formState } = useForm<Values, unknown, z.output<typeof ApprovalInputSchema>>({
    resolver: zodResolver(ApprovalInputSchema),
    defaultValues: { decision: "approve", comment: "", version: draftVersion },
  });

  const submitAs = (decision: "approve" | "reject") => () => {
    setValue("decision", decision);
    void handleSubmit(async (values) => {
      setFormError(null);
      try {
        await decide.mutateAsync({ id: materialId, input: values });
      } catch (error) {
        setFormError(applyServerErrors(error, setError, ["comment"]));
      }
    })();
  };

  return (
    <form noValidate className="space-y-3" aria-label={`Decide on version ${draftVersion}`} onSubmit={(e) => e.preventDefault()}>
      {formError ? <Callout tone="error" title="The decision was not saved">{formError}</Callout> : null}
      <TextAreaField label="Comment" hint="Required to reject: say what to change. Optional when approving." error={formState.errors.comment?.message} {...register("comment")} />
      <div className="flex flex-wrap gap-3">
        <Button onClick={submitAs("approve")} busy={decide.isPending && decide.variables?.input.decision === "approve"}>
          Approve version {draftVersion}
        </Button>
        <Button variant="danger" onClick={submitAs("reject")} busy={decide.isPending && decide.variables?.input.decision === "reject"}>
          Reject version {draftVersion}
        </Button>
      </div>
    </form>
  );
}
