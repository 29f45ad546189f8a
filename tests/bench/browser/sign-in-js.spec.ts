import { gzipSync } from "node:zlib";
import { test } from "@playwright/test";

// A size script, not a check: it prints the JavaScript the sign-in page loads before anyone
// signs in, gzipped as a server would send it (target ≤ 200 kB), and never asserts on it.
test("initial JavaScript of the sign-in route", async ({ page }) => {
  const scripts = new Map<string, Promise<Buffer>>();
  page.on("response", (response) => {
    if (response.request().resourceType() === "script") scripts.set(new URL(response.url()).pathname, response.body());
  });
  await page.goto("/sign-in");
  await page.getByRole("button", { name: "Sign in" }).waitFor();
  await page.waitForLoadState("networkidle");
  let raw = 0;
  let gzip = 0;
  const rows: string[] = [];
  for (const [path, body] of scripts) {
    const bytes = await body;
    const zipped = gzipSync(bytes, { level: 9 }).length;
    raw += bytes.length;
    gzip += zipped;
    rows.push(`  ${path}: ${(bytes.length / 1024).toFixed(1)} kB, gzip ${(zipped / 1024).toFixed(1)} kB`);
  }
  console.log(`sign-in route initial JavaScript: ${scripts.size} files, ${(raw / 1024).toFixed(1)} kB, gzip ${(gzip / 1024).toFixed(1)} kB (target ≤ 200 kB gzip)\n${rows.join("\n")}`);
});
