// A bundler user's path: a small app imports "flexura" and its subpaths by name (the package's own exports map,
// resolved by rolldown exactly as in a user's project), is bundled into one file, and runs in Chromium.
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { rolldown } from "rolldown";
import { assertBuilt, browserAvailable, launchChromium, ROOT, serveRoot } from "./harness.js";
import { runScenario, type ScenarioResults } from "./page/scenario.js";

const load = (name: string): Promise<Record<string, unknown>> => import(pathToFileURL(join(ROOT, "dist", `${name}.js`)).href);

describe.runIf(browserAvailable())("the package bundled into an app, in Chromium", () => {
  let browser: Browser;
  let server: Awaited<ReturnType<typeof serveRoot>>;
  beforeAll(async () => {
    assertBuilt();
    const bundle = await rolldown({ input: join(ROOT, "tests", "browser", "bundle", "app.js"), platform: "browser", cwd: ROOT });
    await bundle.write({ file: join(ROOT, ".tmp", "browser", "app.bundle.js"), format: "esm", minify: true });
    await bundle.close();
    server = await serveRoot();
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it("gives the same results as Node", async () => {
    const page = await browser.newPage();
    const failures: string[] = [];
    page.on("pageerror", (e) => failures.push(String(e)));
    await page.goto(`${server.url}/tests/browser/bundle/index.html`);
    await page.waitForSelector("body[data-state]", { timeout: 20000 });
    const text = (await page.textContent("#results")) ?? "";
    expect(failures).toEqual([]);
    expect(await page.getAttribute("body", "data-state"), text).toBe("done");
    const lib = { flexura: await load("index"), model: await load("model"), report: await load("report"), section: await load("section") };
    expect(JSON.parse(text) as ScenarioResults).toEqual(runScenario(lib));
    await page.close();
  });
});
