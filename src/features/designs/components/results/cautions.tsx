import { WarningIcon } from "../../../../components/ui/icons";

// The product's cautions, word for word in substance; shown beside every set of results.
const CAUTIONS = [
  "Estimates only.",
  "Cryogens displace oxygen (asphyxiation).",
  "Trapped liquid builds pressure: every closed volume needs relief.",
  "Cold surfaces burn skin; liquid-nitrogen-cold surfaces condense oxygen-rich liquid from air.",
  "Loss of vacuum multiplies the heat leak by orders of magnitude.",
  "Local codes, the site's oxygen-deficiency procedure and licensed engineering practice govern.",
];

export function Cautions() {
  return (
    <section aria-labelledby="cautions-heading" className="rounded-md border border-ember-400/60 bg-ember-900/30 p-4 text-sm text-ember-200">
      <h3 id="cautions-heading" className="flex items-center gap-2 font-semibold">
        <WarningIcon className="size-4" />
        Cautions
      </h3>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </section>
  );
}
