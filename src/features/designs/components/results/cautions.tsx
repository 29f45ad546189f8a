import { CautionsBox } from "../../../../components/ui/cautions-box";

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
  return <CautionsBox cautions={CAUTIONS} />;
}
