import type { Cryogen } from "../../../../shared/schemas/cryogen";
import { TextLink } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { formatNumber } from "../utils/library-text";
import { ScopeLabel } from "./status-label";

const HEADERS = ["Fluid", "Saturation temperature, K", "Latent heat, kJ/kg", "Liquid density, kg/m³", "Vapour density, kg/m³", "Molar mass, g/mol", "Vented share of boil-off", "Scope", "Source"];

/** The approved cryogens designs can pick, saturated at 1 atm, each with its source. */
export function CryogensTable({ cryogens }: { cryogens: Cryogen[] }) {
  if (cryogens.length === 0) return <p className="text-sm text-ink-300">No approved cryogens yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Cryogens and their properties at 1 atm</caption>
        <thead>
          <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
            {HEADERS.map((h) => (
              <th key={h} scope="col" className="pb-2 pr-4 align-bottom font-medium">{h}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {cryogens.map((c) => (
            <tr key={c.materialId} className="border-t border-ink-800 align-top">
              <th scope="row" className="py-2.5 pr-4 text-left font-normal">
                <TextLink to={paths.app.libraryEntry.getHref(c.materialId)}>{c.label}</TextLink>
              </th>
              <td className="py-2.5 pr-4 text-ink-100">{formatNumber(c.saturationTemperature_K)}</td>
              <td className="py-2.5 pr-4 text-ink-100">{formatNumber(c.latentHeat_J_per_kg / 1000)}</td>
              <td className="py-2.5 pr-4 text-ink-100">{formatNumber(c.liquidDensity_kg_per_m3)}</td>
              <td className="py-2.5 pr-4 text-ink-100">{formatNumber(c.vapourDensity_kg_per_m3)}</td>
              <td className="py-2.5 pr-4 text-ink-100">{formatNumber(c.molarMass_kg_per_mol * 1000)}</td>
              <td className="py-2.5 pr-4 text-ink-100">{formatNumber(c.ventedGasFactor * 100, 3)} %</td>
              <td className="py-2.5 pr-4"><ScopeLabel scope={c.scope} /></td>
              <td className="min-w-80 py-2.5 text-xs leading-relaxed text-ink-300">{c.sourceText}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
