import { describe, expect, it } from "vitest";
import { AlertSchema } from "../../shared/schemas/alert";
import { SeriesSchema, TestDetailSchema, TestSummarySchema } from "../../shared/schemas/boil-off-test";
import { seedDemoDesigns } from "../../server/services/demo-designs";
import { seedDemoTests } from "../../server/services/demo-tests";
import { useTestApp } from "../support/test-app";

/** The demo seed `npm start` runs: PRODUCT.md's "a few boil-off tests, one of which runs 40 % over its prediction". */
const t = useTestApp();

describe("the demo boil-off tests", () => {
  it("seeds three tests on the demo designs, one 40 % over its prediction with an open alert, once", async () => {
    expect(await seedDemoDesigns(t.ctx)).toBe(true);
    t.smtp.clear();
    expect(await seedDemoTests(t.ctx)).toBe(true);
    expect(await seedDemoTests(t.ctx)).toBe(false);

    const viewer = await t.signInAs("viewer");
    const tests = ((await viewer.get("/api/boil-off-tests")).body.tests as unknown[]).map((x) => TestSummarySchema.parse(x));
    const byVessel = Object.fromEntries(tests.map((x) => [x.vesselLabel, x]));
    expect(Object.keys(byVessel).sort()).toEqual(["Detector dewar DD-3", "Magnet cryostat MC-250", "Storage dewar SD-180"]);
    expect(byVessel["Storage dewar SD-180"]).toMatchObject({ method: "weighing", status: "accepted", designName: "180 L liquid-nitrogen storage dewar", revision: 2 });
    expect(byVessel["Magnet cryostat MC-250"]).toMatchObject({ method: "vent-flow", status: "analysed", designName: "250 L helium magnet cryostat", revision: 3 });
    expect(byVessel["Detector dewar DD-3"]).toMatchObject({ method: "level", status: "accepted", designName: "Detector dewar, 3 L" });
    // The invented ratios come back out of the fit over the suggested window.
    expect(byVessel["Storage dewar SD-180"].ratio!).toBeCloseTo(1.04, 1);
    expect(byVessel["Magnet cryostat MC-250"].ratio!).toBeCloseTo(1.1, 1);
    expect(byVessel["Detector dewar DD-3"].ratio!).toBeCloseTo(1.4, 1);

    for (const summary of tests) {
      const detail = TestDetailSchema.parse((await viewer.get(`/api/boil-off-tests/${summary.id}`)).body);
      expect(detail.log!.rows).toBeGreaterThan(700);
      expect(detail.analysis!.suggested).toBe(true);
      // The suggestion skips the invented cool-down after the fill (it halves every 40 minutes).
      expect(detail.analysis!.window.start_s).toBeGreaterThan(3600);
      const chart = SeriesSchema.parse((await viewer.get(`/api/boil-off-tests/${summary.id}/series`)).body);
      expect(chart.points.length).toBeLessThanOrEqual(2000);
    }
    expect(TestDetailSchema.parse((await viewer.get(`/api/boil-off-tests/${byVessel["Storage dewar SD-180"].id}`)).body).log!.pressureColumn).toBe("barometer (hPa)");

    const alerts = ((await viewer.get("/api/alerts")).body.alerts as unknown[]).map((a) => AlertSchema.parse(a));
    expect(alerts.map((a) => a.vesselLabel)).toEqual(["Detector dewar DD-3"]);
    await t.ctx.outbox.flush();
    const mails = t.smtp.messages.filter((m) => m.subject.startsWith("Boil-off test over its prediction: Detector dewar DD-3"));
    expect(mails.flatMap((m) => m.to).sort()).toEqual(["engineer@kestrelbay.example", "owner@kestrelbay.example"]);
  });
});
