import { useState } from "react";
import { ConfirmButton } from "../../../components/ui/confirm-button";
import { TextAreaField } from "../../../components/ui/field";
import { useRetireMaterial } from "../api/retire-material";

/** Retiring keeps every version for old designs but takes the entry off the pick lists. */
export function RetireButton({ materialId, name, hasDraft }: { materialId: string; name: string; hasDraft: boolean }) {
  const retire = useRetireMaterial();
  const [comment, setComment] = useState("");
  return (
    <ConfirmButton
      label="Retire"
      triggerLabel={`Retire ${name}`}
      title={`Retire ${name}?`}
      description={
        <div className="space-y-3">
          <p>New designs can no longer pick it. Designs that already use it keep their version.{hasDraft ? " The open draft is rejected." : ""}</p>
          <TextAreaField label="Why (optional)" value={comment} maxLength={1000} onChange={(e) => setComment(e.target.value)} />
        </div>
      }
      confirmLabel="Retire entry"
      onConfirm={() => retire.mutateAsync({ id: materialId, comment: comment.trim() || null })}
    />
  );
}
