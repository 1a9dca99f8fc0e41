// The example app (examples/web/): a member-checking form on the published ESM files, in Chromium. Its numbers
// must be the library's for the same model, must follow what the user types, and bad input must show the model
// reader's own message. A screenshot is kept as an artifact in .tmp/browser/ (looked at, not compared by pixel).
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { FIELDS, memberModel } from "../../examples/web/model.js";
import { assertBuilt, browserAvailable, launchChromium, ROOT, serveRoot } from "./harness.js";

interface ModelModule {
  parseModel(json: unknown): unknown;
  analyzeModel(model: unknown): { moment: { max: { value: number } }; deflection: { min: { value: number } }; checks: { kind: string; pass: boolean }[] };
}
interface ReportModule {
  formatReportNumber(value: number, digits?: number): string;
}
const load = async <T>(name: string): Promise<T> => (await import(pathToFileURL(join(ROOT, "dist", `${name}.js`)).href)) as T;

const defaults = (): Record<string, string> => Object.fromEntries(FIELDS.map((f) => [f.name, f.value]));
const resultText = (page: Page, name: string): Promise<string | null> => page.textContent(`#results tr[data-result="${name}"] td.number`);

describe.runIf(browserAvailable())("example app in Chromium", () => {
  let browser: Browser;
  let server: Awaited<ReturnType<typeof serveRoot>>;
  let model: ModelModule;
  let report: ReportModule;
  beforeAll(async () => {
    assertBuilt();
    server = await serveRoot();
    browser = await launchChromium();
    model = await load<ModelModule>("model");
    report = await load<ReportModule>("report");
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  const expected = (values: Record<string, string>): ReturnType<ModelModule["analyzeModel"]> => model.analyzeModel(model.parseModel(memberModel(values)));

  it("shows the library's results, follows typing, and shows the reader's message for bad input", async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 1100 } });
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(String(e)));
    await page.goto(`${server.url}/examples/web/index.html`);
    await page.waitForSelector("#output[data-state='ok']", { timeout: 20000 });
    const first = expected(defaults());
    expect(await resultText(page, "Largest moment")).toBe(report.formatReportNumber(first.moment.max.value));
    expect(await resultText(page, "Largest deflection")).toBe(report.formatReportNumber(first.deflection.min.value));
    expect(await page.locator("#checks tbody tr").count()).toBe(first.checks.length);
    expect(await page.locator("#diagrams svg").count()).toBe(4);
    mkdirSync(join(ROOT, ".tmp", "browser"), { recursive: true });
    await page.screenshot({ path: join(ROOT, ".tmp", "browser", "example-web.png"), fullPage: true });

    // Typing a longer span updates the numbers: the moment grows (w L^2 / 8 and P a b / L grow with L; common practice).
    const before = Number(first.moment.max.value);
    await page.fill("#span", "6.6");
    const longer = expected({ ...defaults(), span: "6.6" });
    await page.waitForFunction((text) => document.querySelector('#results tr[data-result="Largest moment"] td.number')?.textContent === text, report.formatReportNumber(longer.moment.max.value));
    expect(longer.moment.max.value).toBeGreaterThan(before);
    const verdict = (await page.textContent("#verdict")) ?? "";
    expect(verdict).toBe(longer.checks.every((c) => c.pass) ? "The member passes every check." : "The member fails at least one check.");

    // A point load beyond the span: the model reader's message, naming the field's path.
    await page.fill("#pointAt", "9");
    await page.waitForSelector("#output[data-state='invalid']");
    expect((await page.textContent("#problems")) ?? "").toMatch(/loads\[1\]\.at: .*outside the member/);
    await page.screenshot({ path: join(ROOT, ".tmp", "browser", "example-web-invalid.png"), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });
});
