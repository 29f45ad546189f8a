import { useState } from "react";
import type { Series, TestDetail } from "../../../../shared/schemas/boil-off-test";
import { ErrorMessage } from "../../../components/errors/error-message";
import { useResetWindow, useSetWindow } from "../api/set-window";
import { ResidualsChart } from "./residuals-chart";
import { SeriesChart } from "./series-chart";
import { WindowControls } from "./window-controls";

/**
 * The chart, the window's sliders and the residuals. The parent keys this by the stored window,
 * so a refit (or a new log) starts the sliders again from what the server holds.
 */
export function WindowSection({ test, series, canSet }: { test: TestDetail; series: Series; canSet: boolean }) {
  const [draft, setDraft] = useState(series.window);
  const setWindow = useSetWindow();
  const resetWindow = useResetWindow();
  const duration_s = test.log?.duration_s ?? series.points.at(-1)?.[0] ?? 0;
  return (
    <div className="space-y-5">
      <SeriesChart series={series} method={test.method} window={draft} />
      <WindowControls
        duration_s={duration_s}
        draft={draft}
        onDraft={(w) => {
          setWindow.reset();
          setDraft(w);
        }}
        stored={series.window}
        suggested={series.suggested}
        canSet={canSet}
        busy={setWindow.isPending || resetWindow.isPending}
        onSet={(window) => setWindow.mutate({ testId: test.id, window })}
        onReset={() => resetWindow.mutate(test.id)}
      />
      {/* A refused window (too few readings) keeps the sliders where the user put them. */}
      {setWindow.error ? <ErrorMessage error={setWindow.error} title="The window was not set" /> : null}
      {resetWindow.error ? <ErrorMessage error={resetWindow.error} title="The suggested window was not restored" /> : null}
      <ResidualsChart series={series} method={test.method} />
    </div>
  );
}
