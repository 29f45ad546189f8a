import { zodResolver } from "@hookform/resolvers/zod";
import { useState, type ReactNode } from "react";
import { FormProvider, useForm, type UseFormReturn } from "react-hook-form";
import type { Prediction } from "../../../../shared/design/prediction";
import type { ResolvedMaterial } from "../../../../shared/design/to-assembly";
import { DesignContentSchema, type DesignContent, type DesignContentInput } from "../../../../shared/schemas/design";
import type { LibraryPicks } from "../api/get-library-picks";
import { contentKeyOf, useLivePrediction } from "../hooks/use-live-prediction";
import { DesignForm } from "./design-form/design-form";
import { LibraryProvider } from "./design-form/library-context";
import { ResultsPanel } from "./results/results-panel";

export type DesignFormApi = UseFormReturn<DesignContentInput, unknown, DesignContent>;

type DesignEditorProps = {
  initial: DesignContentInput;
  /** The prediction stored with `initial` (a saved revision), shown until the first edit. */
  savedPrediction?: Prediction;
  known: ResolvedMaterial[];
  picks: LibraryPicks;
  readOnly: boolean;
  /** The page's own controls (save, create), given the form so they can validate and read it. */
  toolbar?: (form: DesignFormApi) => ReactNode;
  /** Shown under the form, e.g. the revisions. */
  below?: ReactNode;
};

/** The Design workspace: the form on one side and its live results on the other. */
export function DesignEditor({ initial, savedPrediction, known, picks, readOnly, toolbar, below }: DesignEditorProps) {
  const form = useForm<DesignContentInput, unknown, DesignContent>({ resolver: zodResolver(DesignContentSchema), mode: "onChange", defaultValues: initial });
  const [savedKey] = useState(() => contentKeyOf(initial));
  const live = useLivePrediction(form, savedPrediction ? { contentKey: savedKey, prediction: savedPrediction } : undefined);

  return (
    <FormProvider {...form}>
      <LibraryProvider picks={picks} known={known}>
        {toolbar?.(form)}
        <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <div className="min-w-0 space-y-6">
            <form noValidate aria-label="Design" onSubmit={(event) => event.preventDefault()}>
              <DesignForm readOnly={readOnly} />
            </form>
            {below}
          </div>
          <div className="min-w-0 xl:sticky xl:top-4 xl:max-h-[calc(100vh-2rem)] xl:overflow-y-auto">
            <ResultsPanel prediction={live.prediction} state={live.state} problems={live.problems} sweepUpdating={live.sweepUpdating} />
          </div>
        </div>
      </LibraryProvider>
    </FormProvider>
  );
}
