import { MaterialVersionInputSchema, ProposeVersionInputSchema, type MaterialDetail } from "../../../../shared/schemas/material";
import { useCreateMaterial } from "../api/create-material";
import { useProposeVersion } from "../api/propose-version";
import { emptyValues } from "./material-form/form-values";
import { fromVersion } from "./material-form/from-version";
import { MaterialForm } from "./material-form/material-form";

/** A new entry: version 1, a draft until an owner approves it. */
export function NewMaterialForm({ onCreated }: { onCreated: (detail: MaterialDetail) => unknown }) {
  const create = useCreateMaterial();
  return (
    <MaterialForm
      label="Propose a new entry"
      defaultValues={emptyValues()}
      schema={MaterialVersionInputSchema}
      submitLabel="Propose entry"
      onSubmit={async (input) => onCreated(await create.mutateAsync(input))}
    />
  );
}

/** A change starts from the version in use (approved, else the latest) and must say what changed. */
export function ProposeChangeForm({ material, onProposed }: { material: MaterialDetail; onProposed: (detail: MaterialDetail) => unknown }) {
  const propose = useProposeVersion();
  return (
    <MaterialForm
      label="Propose a change"
      defaultValues={fromVersion(material.shown)}
      schema={ProposeVersionInputSchema}
      kindLocked
      changeNoteRequired
      submitLabel={`Propose version ${material.latestVersion + 1}`}
      onSubmit={async (input) => onProposed(await propose.mutateAsync({ id: material.id, input }))}
    />
  );
}
