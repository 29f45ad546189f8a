import { ColdSpaceFields, WarmWallFields } from "./boundary-fields";
import { GeometryFields } from "./geometry-fields";
import { LayupEditor } from "./layup-editor";
import { SupportsEditor } from "./supports-editor";
import { VacuumFields } from "./vacuum-fields";

/**
 * The design's inputs, warm to cold. Read-only roles see the same form disabled (one native
 * fieldset disables every control), so they read the design exactly as an engineer would.
 */
export function DesignForm({ readOnly }: { readOnly: boolean }) {
  return (
    <fieldset disabled={readOnly} aria-label="Design inputs" className="min-w-0 space-y-5">
      <GeometryFields />
      <WarmWallFields />
      <ColdSpaceFields />
      <LayupEditor />
      <SupportsEditor />
      <VacuumFields />
    </fieldset>
  );
}
