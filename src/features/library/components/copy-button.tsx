import { Button } from "../../../components/ui/button";
import { ErrorIcon } from "../../../components/ui/icons";
import { useCopyMaterial } from "../api/copy-material";

/** A seed entry cannot change; a copy of it becomes our own draft, to adjust and propose. */
export function CopyButton({ materialId, onCopied }: { materialId: string; onCopied: (newId: string) => unknown }) {
  const copy = useCopyMaterial();
  return (
    <div className="space-y-1">
      <Button variant="secondary" busy={copy.isPending} onClick={() => copy.mutate(materialId, { onSuccess: (detail) => onCopied(detail.id) })}>
        Copy to our library
      </Button>
      {copy.error ? (
        <p role="alert" className="flex items-start gap-1 text-sm text-fault-300">
          <ErrorIcon className="mt-0.5 size-4" />
          <span>{copy.error.message}</span>
        </p>
      ) : null}
    </div>
  );
}
