import type { QueryClient } from "@tanstack/react-query";
import { useSearchParams } from "react-router-dom";
import { ErrorMessage } from "../../components/errors/error-message";
import { Card } from "../../components/ui/card";
import { PageHeader } from "../../components/ui/page-header";
import { Loading } from "../../components/ui/spinner";
import { useComparison } from "../../features/compare/api/get-comparison";
import { CompareCharts } from "../../features/compare/components/compare-charts";
import { ComparePicker, idToPick, pickToId, type ComparePick } from "../../features/compare/components/compare-picker";
import { CompareTable } from "../../features/compare/components/compare-table";
import { PriceField } from "../../features/compare/components/price-field";
import { designsQueryOptions, useDesigns } from "../../features/designs/api/get-designs";
import { useDebouncedValue } from "../../hooks/use-debounced-value";
import { useUnitSystem } from "../../lib/unit-system";

export const clientLoader = (queryClient: QueryClient) => async () => {
  await queryClient.prefetchQuery(designsQueryOptions(""));
  return null;
};

// What is compared lives in the URL, so a comparison can be bookmarked and sent to a colleague.
export default function CompareRoute() {
  const [params, setParams] = useSearchParams();
  const system = useUnitSystem();
  const ids = (params.get("ids") ?? "").split(",").filter(Boolean);
  const picks = ids.map(idToPick);
  const priceText = params.get("price_per_L");
  const pricePerL = priceText !== null && Number.isFinite(Number(priceText)) ? Number(priceText) : null;
  const price = useDebouncedValue(pricePerL, 300);
  const designs = useDesigns("");
  const comparison = useComparison(ids, price);

  const update = (next: { picks?: ComparePick[]; pricePerL?: number | null }) => {
    const query = new URLSearchParams();
    const p = next.picks ?? picks;
    if (p.length > 0) query.set("ids", p.map(pickToId).join(","));
    const pr = next.pricePerL === undefined ? pricePerL : next.pricePerL;
    if (pr !== null) query.set("price_per_L", String(pr));
    setParams(query, { replace: true });
  };

  const options = (designs.data?.designs ?? []).map((d) => ({ id: d.id, name: d.name, latestRevision: d.latestRevision }));
  return (
    <>
      <title>Compare · Frostfold</title>
      <PageHeader title="Compare" description="Two to six designs side by side: heat per stage, boil-off, hold time, yearly cryogen cost, blanket mass and cost." />
      <div className="space-y-6">
        <Card title="What to compare">
          {designs.error ? <ErrorMessage error={designs.error} title="Could not load the designs" /> : null}
          <div className="space-y-5">
            {designs.isPending ? <Loading label="Loading designs…" /> : <ComparePicker options={options} picks={picks} onChange={(p) => update({ picks: p })} />}
            <div className="max-w-sm">
              <PriceField pricePerL={pricePerL} system={system} onChange={(p) => update({ pricePerL: p })} />
            </div>
          </div>
        </Card>
        {ids.length < 2 ? <p className="text-sm text-ink-300">Pick at least two designs above.</p> : null}
        {comparison.error ? <ErrorMessage error={comparison.error} title="Could not compare" /> : null}
        {ids.length >= 2 && comparison.isPending ? <Loading label="Comparing…" /> : null}
        {comparison.data && ids.length >= 2 ? (
          <>
            <Card title="Side by side">
              <CompareTable result={comparison.data} />
            </Card>
            <Card title="Charts">
              <CompareCharts result={comparison.data} />
            </Card>
          </>
        ) : null}
      </div>
    </>
  );
}
