import { useFieldArray, useFormContext } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { Button } from "../../../../components/ui/button";
import { ErrorIcon } from "../../../../components/ui/icons";
import { newBlock, newStage } from "../../lib/default-content";
import { BlockFields } from "./block-fields";
import { FormSection } from "./form-section";
import { ItemToolbar } from "./item-toolbar";
import { useLibrary } from "./library-context";
import { StageFields } from "./stage-fields";

type Block = Extract<DesignContentInput["layup"][number], { kind: "block" }>;

/** The layup, warm → cold: blocks of layers, with cooled stages between them. */
export function LayupEditor() {
  const { control, getValues, formState } = useFormContext<DesignContentInput>();
  const { picks } = useLibrary();
  const { fields, append, remove, move } = useFieldArray({ control, name: "layup" });
  const blocks = fields.filter((f) => f.kind === "block").length;
  const rootError = formState.errors.layup?.root?.message ?? formState.errors.layup?.message;

  // Numbered separately, as people speak of them: "block 2", "stage 1".
  let blockNo = 0;
  let stageNo = 0;
  const lastBlock = () => [...getValues("layup")].reverse().find((i): i is Block => i.kind === "block");

  return (
    <FormSection title="Layup" description="From the warm wall to the cold vessel. A cooled stage sits between two blocks.">
      {rootError ? (
        <p className="flex items-start gap-1.5 text-sm text-fault-300">
          <ErrorIcon className="mt-0.5 size-4" />
          <span>{rootError}</span>
        </p>
      ) : null}
      <ol className="space-y-4">
        {fields.map((item, index) => {
          const name = item.kind === "block" ? `block ${++blockNo}` : `stage ${++stageNo}`;
          const title = item.kind === "block" ? `Block ${blockNo}` : `Cooled stage ${stageNo}`;
          return (
            <li key={item.id}>
              <fieldset className={`space-y-3 rounded-md border p-4 ${item.kind === "stage" ? "border-frost-700 border-l-4 bg-frost-900/20" : "border-ink-700 bg-ink-950/40"}`}>
                {/* The legend must be the fieldset's first child to name it; floats put the toolbar beside it. */}
                <legend className="float-left pt-1 text-sm font-semibold text-ink-50">{title}</legend>
                <div className="float-right">
                  <ItemToolbar
                    name={name}
                    index={index}
                    count={fields.length}
                    onMove={move}
                    onRemove={remove}
                    removeBlocked={item.kind === "block" && blocks === 1 ? "A layup needs at least one block" : undefined}
                  />
                </div>
                <div className="clear-both pt-1">{item.kind === "block" ? <BlockFields index={index} /> : <StageFields index={index} />}</div>
              </fieldset>
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" size="sm" onClick={() => append(newBlock(picks, lastBlock()))}>
          + Add block
        </Button>
        <Button variant="secondary" size="sm" onClick={() => append([newStage(picks, stageNo + 1), newBlock(picks, lastBlock())])}>
          + Add cooled stage and block
        </Button>
      </div>
    </FormSection>
  );
}
