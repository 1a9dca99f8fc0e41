// The calculation sheet proven by looking: every example's sheet printed to PDF by Debian's Chromium and
// rasterised to PNG by poppler's pdftoppm (kept in reports/sheets/ as CI artifacts); one page per member.
import { existsSync, readFileSync, rmSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { assertBuilt, browserAvailable, ROOT } from "./harness.js";
// @ts-expect-error -- a plain ESM script with no type declarations
import { popplerAvailable, renderExampleSheets } from "../../scripts/calc-sheets.mjs";

function printingAvailable(): boolean {
  if (!browserAvailable()) return false;
  if ((popplerAvailable as () => boolean)()) return true;
  if (process.env.CI === "true") throw new Error("CI=true but pdftoppm/pdfinfo are missing: .ci/run installs them with apt-get (package poppler-utils)");
  console.log("calculation-sheet PDF tests skipped: pdftoppm not found; install it with `apt-get install poppler-utils` (Debian)");
  return false;
}

interface Rendered {
  readonly model: string;
  readonly html: string;
  readonly pdf: string;
  readonly pages: number;
  readonly pngs: readonly string[];
}

describe.runIf(printingAvailable())("calculation sheets printed by Chromium", () => {
  it("prints every example on exactly one page, with a PNG of it", async () => {
    assertBuilt();
    const out = join(ROOT, "reports", "sheets");
    rmSync(out, { recursive: true, force: true });
    const results = (await (renderExampleSheets as (o: string) => Promise<Rendered[]>)(out));
    expect(results.length).toBeGreaterThanOrEqual(4);
    for (const r of results) {
      expect(r.pages, `${r.model} should print on one page`).toBe(1);
      expect(r.pngs).toHaveLength(1);
      const png = readFileSync(r.pngs[0] as string);
      // PNG signature (ISO/IEC 15948 5.2) and a page-sized raster: A4 at 110 dpi is about 909 x 1286 pixels.
      expect(png.subarray(0, 8).toString("hex")).toBe("89504e470d0a1a0a");
      const width = png.readUInt32BE(16);
      const height = png.readUInt32BE(20);
      expect(width).toBeGreaterThan(850);
      expect(height / width).toBeCloseTo(297 / 210, 1);
      expect(existsSync(r.html)).toBe(true);
    }
  }, 240000);
});
