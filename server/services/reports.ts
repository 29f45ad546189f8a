import PDFDocument from "pdfkit";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { RevisionDetail } from "../../shared/schemas/design";
import type { Actor, ServiceContext } from "./context";
import { getRevision } from "./designs";

const fontsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../fonts");
// pdfkit cannot subset .woff2; the .woff of the same faces works.
const FONT = { regular: path.join(fontsDir, "ibm-plex-sans-latin-400-normal.woff"), bold: path.join(fontsDir, "ibm-plex-sans-latin-600-normal.woff") };

export const CAUTIONS = [
  "Estimates only: a prediction is no substitute for a boil-off test of the real vessel.",
  "Cryogens displace oxygen: vent to a safe place and follow the site's oxygen-deficiency procedure.",
  "Trapped liquid builds pressure: every closed volume needs relief.",
  "Cold surfaces burn skin; surfaces at liquid-nitrogen temperature condense oxygen-rich liquid from air.",
  "Loss of vacuum multiplies the heat leak by orders of magnitude.",
  "Local codes and licensed engineering practice govern.",
];

const fmt = (x: number | null | undefined, digits = 3) => (x == null || !Number.isFinite(x) ? "—" : Number(x.toPrecision(digits)).toString());

/** A PDF of one revision: inputs, materials with sources, results per stage, wall section, sweep, cautions. */
export async function revisionReport(ctx: ServiceContext, actor: Actor, designId: string, revision: number): Promise<{ filename: string; pdf: Buffer }> {
  const r = await getRevision(ctx, actor, designId, revision);
  const pdf = await renderReport(r, ctx.clock());
  const slug = r.name.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "design";
  return { filename: `frostfold-${slug}-rev${r.revision}.pdf`, pdf };
}

export function renderReport(r: RevisionDetail, printedAt: Date): Promise<Buffer> {
  // Uncompressed so the text is searchable by simple tools; the reports are small.
  const doc = new PDFDocument({ size: "A4", margin: 48, compress: false, info: { Title: `${r.name}, revision ${r.revision}`, Author: "Frostfold", Subject: "Heat-leak and boil-off estimate" } });
  doc.registerFont("body", FONT.regular);
  doc.registerFont("bold", FONT.bold);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on("end", () => resolve(Buffer.concat(chunks))));

  const h = (text: string) => doc.moveDown(0.6).font("bold").fontSize(12).text(text).moveDown(0.2).font("body").fontSize(9.5);
  const line = (text: string) => doc.text(text);

  doc.font("bold").fontSize(18).text(r.name);
  doc.font("body").fontSize(10).text(`Revision ${r.revision}${r.changeNote ? ` — ${r.changeNote}` : ""}`);
  doc.text(`Saved ${r.createdAt.slice(0, 16).replace("T", " ")} UTC by ${r.createdBy ?? "—"}; printed ${printedAt.toISOString().slice(0, 16).replace("T", " ")} UTC`);

  const p = r.prediction;
  h("Results");
  line(`Heat into the cold vessel: ${fmt(p.coldHeat_W)} W; heat flux ${fmt(p.result.heatFlux_W_per_m2)} W/m²`);
  if (p.coldBoilOff_L_per_day !== null) line(`Boil-off: ${fmt(p.coldBoilOff_L_per_day)} L/day; evaporation rate ${fmt(p.evaporationRate_percent_per_day)} %/day; hold time ${fmt(p.holdTime_h)} h`);
  for (const s of p.result.stages) {
    line(
      `${s.label} at ${fmt(s.temperature_K, 4)} K: in ${fmt(s.heatIn.total_W)} W (radiation ${fmt(s.heatIn.radiation_W)}, solid ${fmt(s.heatIn.solid_W)}, gas ${fmt(s.heatIn.gas_W)}, supports ${fmt(s.heatIn.supports_W)}); net ${fmt(s.net_W)} W` +
        (s.boilOff ? `; boil-off ${fmt(s.boilOff.liquidVolume_L_per_day)} L/day, ${fmt(s.boilOff.evaporatedMass_kg_per_h * 24)} kg/day` : ""),
    );
  }
  if (p.result.band) for (const b of p.result.band) line(`Band for ${b.label}: ${fmt(b.low_W)} to ${fmt(b.high_W)} W (nominal ${fmt(b.nominal_W)} W)`);
  for (const w of p.result.warnings) line(`Warning: ${w}`);

  h("Inputs");
  const c = r.content;
  const g = c.geometry;
  line(g.kind === "planar" ? `Flat panel, ${fmt(g.area_m2)} m²` : g.kind === "cylinder" ? `Cylinder: cold radius ${fmt(g.coldRadius_m)} m, warm radius ${fmt(g.warmRadius_m)} m, length ${fmt(g.length_m)} m, ${g.flatEnds} flat end(s)` : `Sphere: cold radius ${fmt(g.coldRadius_m)} m, warm radius ${fmt(g.warmRadius_m)} m`);
  line(`Warm wall ${fmt(c.warm.temperature_K, 4)} K; vacuum ${fmt(c.vacuum.pressure_Pa)} Pa of ${c.vacuum.gas}; capacity ${fmt(c.cold.capacity_L)} L, fill ${fmt(c.cold.fillFraction)} to ${fmt(c.cold.minimumFraction)}`);
  c.layup.forEach((item, i) => {
    line(item.kind === "block" ? `${i + 1}. Block: ${item.layers} layers at ${fmt(item.layerDensity_per_cm)} layers/cm, model ${item.model}, degradation ×${fmt(item.degradationFactor)}` : `${i + 1}. Stage "${item.label}" at ${fmt(item.temperature_K, 4)} K`);
  });
  for (const s of c.supports) line(`Support${s.label ? ` "${s.label}"` : ""}: ${s.count} × ${fmt(s.area_m2)} m² over ${fmt(s.length_m)} m, from ${s.from} to ${s.to}`);

  h("Library values used (exact versions)");
  for (const m of r.materials) line(`${m.name} (v${m.version}) — ${m.source}`);

  h("Wall section: shield temperatures, warm to cold");
  const temps = p.result.shields.map((s) => (s.temperature_K === null ? "—" : fmt(s.temperature_K, 4))).join(", ");
  line(temps.length > 0 ? `${temps} K` : "No shields.");

  if (p.sweep) {
    h(`Layer-count sweep of layup item ${p.sweep.layupIndex + 1}`);
    line(p.sweep.points.map((pt) => `${pt.layers}: ${fmt(pt.coldHeat_W)} W`).join("; "));
    if (p.sweep.targetColdHeat_W !== null) line(`Target ${fmt(p.sweep.targetColdHeat_W)} W: fewest layers ${p.sweep.fewestLayers ?? "none up to the limit"}`);
  }

  h("Assumptions");
  line("Gray, diffuse, opaque surfaces; view factor 1 between concentric or large parallel surfaces; stages at fixed temperatures; saturated cryogen at 1 atm; vent flow at 0 °C and 101.325 kPa.");
  h("Cautions");
  for (const caution of CAUTIONS) line(`• ${caution}`);
  doc.end();
  return done;
}
