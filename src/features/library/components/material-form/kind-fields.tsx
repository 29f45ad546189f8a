import type { MaterialKind } from "../../../../../shared/schemas/material";
import { CorrelationFields, CryogenFields, SupportFields } from "./engine-data-fields";
import { SpacerFields } from "./spacer-fields";
import { ReflectorFields, WallFinishFields } from "./surface-fields";

/** The properties that belong to the entry's kind; the others stay in the form, unused. */
export function KindFields({ kind }: { kind: MaterialKind }) {
  switch (kind) {
    case "reflector":
      return <ReflectorFields />;
    case "wall-finish":
      return <WallFinishFields />;
    case "spacer":
      return <SpacerFields />;
    case "support-material":
      return <SupportFields />;
    case "correlation-set":
      return <CorrelationFields />;
    case "cryogen":
      return <CryogenFields />;
  }
}
