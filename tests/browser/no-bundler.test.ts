// The published ESM files in a real browser, loaded the way a page without a bundler loads them (an import map
// for the package's entries and decimal.js); the page's numbers must equal Node's for the same calls.
import { pathToFileURL } from "node:url";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { assertBuilt, browserAvailable, launchChromium, ROOT, serveRoot } from "./harness.js";
import { runScenario, type ScenarioResults } from "./page/scenario.js";

const load = (name: string): Promise<Record<string, unknown>> => import(pathToFileURL(join(ROOT, "dist", `${name}.js`)).href);

describe.runIf(browserAvailable())("published ESM files in Chromium, no bundler", () => {
  let browser: Browser;
  let server: Awaited<ReturnType<typeof serveRoot>>;
  beforeAll(async () => {
    assertBuilt();
    server = await serveRoot();
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it("runs a beam, a section, a model analysis, a report and SVG diagrams, with Node's numbers", async () => {
    const page = await browser.newPage();
    const failures: string[] = [];
    page.on("pageerror", (e) => failures.push(String(e)));
    page.on("requestfailed", (r) => failures.push(`request failed: ${r.url()}`));
    await page.goto(`${server.url}/tests/browser/page/index.html`);
    await page.waitForSelector("body[data-state]", { timeout: 20000 });
    const state = await page.getAttribute("body", "data-state");
    const text = (await page.textContent("#results")) ?? "";
    expect(failures).toEqual([]);
    expect(state, text).toBe("done");
    const inBrowser = JSON.parse(text) as ScenarioResults;
    const lib = { flexura: await load("index"), model: await load("model"), report: await load("report"), section: await load("section") };
    const inNode = runScenario(lib);
    // The same IEEE-754 arithmetic on the same code: the results are identical, not merely close.
    expect(inBrowser).toEqual(inNode);
    // Hand check on the beam (common practice: statics of a simple span): R = 5*6/2 + 20*4/6 and 5*6/2 + 20*2/6.
    expect(inBrowser.reactions[0]).toBeCloseTo(15 + 80 / 6, 10);
    expect(inBrowser.reactions[1]).toBeCloseTo(15 + 40 / 6, 10);
    expect(inBrowser.reportHasCaution).toBe(true);
    // The SVG diagrams are parsed by the browser's own SVG parser into the DOM.
    const svgCount = await page.locator("#diagrams svg").count();
    expect(svgCount).toBe(inNode.diagramNames.length);
    expect(svgCount).toBeGreaterThanOrEqual(4);
    await page.close();
  });

  it("a page that misses decimal.js fails loudly, not with wrong numbers", async () => {
    const page = await browser.newPage();
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(String(e)));
    page.on("console", (m) => { if (m.type() === "error") errors.push(m.text()); });
    await page.goto(`${server.url}/tests/browser/page/missing-dependency.html`);
    await page.waitForTimeout(500);
    expect(await page.getAttribute("body", "data-state")).toBeNull();
    expect(errors.join("\n")).toMatch(/decimal\.js|resolve|404|Failed/i);
    await page.close();
  });
});
