// Renders every example model's calculation sheet to HTML, then to PDF in headless Chromium (Debian
// `chromium`, --print-to-pdf, no GPU) and to PNG pages with `pdftoppm` (Debian `poppler-utils`), in
// reports/sheets/ (kept as CI artifacts). Runs against the built package (dist/): `npm run build` first.
//   node scripts/calc-sheets.mjs [out-folder]
import { execFileSync } from "node:child_process";
import { mkdirSync, readdirSync, readFileSync, writeFileSync, existsSync } from "node:fs";
import { basename, join, resolve } from "node:path";
import { pathToFileURL } from "node:url";

const ROOT = resolve(import.meta.dirname, "..");

/** The Chromium binary, or undefined. */
export function chromiumBinary() {
  const candidates = process.env.FLEXURA_CHROMIUM ? [process.env.FLEXURA_CHROMIUM] : ["/usr/bin/chromium", "/usr/bin/chromium-browser"];
  return candidates.find((p) => existsSync(p));
}

/** Whether poppler's pdftoppm and pdfinfo are on the PATH. */
export function popplerAvailable() {
  try {
    execFileSync("pdfinfo", ["-v"], { stdio: "ignore" });
    execFileSync("pdftoppm", ["-v"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

/** Prints one HTML file to PDF with headless Chromium. */
export function printToPdf(html, pdf, chromium = chromiumBinary()) {
  if (chromium === undefined) throw new Error("Chromium not found: install it with `apt-get install chromium` (Debian)");
  execFileSync(
    chromium,
    ["--headless", "--no-sandbox", "--disable-gpu", "--disable-software-rasterizer", "--no-pdf-header-footer", `--print-to-pdf=${pdf}`, pathToFileURL(html).href],
    { stdio: "ignore", timeout: 120000 },
  );
}

/** The page count pdfinfo reports. */
export function pageCount(pdf) {
  const info = execFileSync("pdfinfo", [pdf], { encoding: "utf8" });
  const m = /^Pages:\s+(\d+)/m.exec(info);
  if (m === null) throw new Error(`pdfinfo gave no page count for ${pdf}`);
  return Number(m[1]);
}

/** Renders every example: returns [{ model, html, pdf, pages, pngs }]. */
export async function renderExampleSheets(out = join(ROOT, "reports", "sheets")) {
  const { analyzeModel, parseModel } = await import(pathToFileURL(join(ROOT, "dist", "model.js")).href);
  const { calculationSheet } = await import(pathToFileURL(join(ROOT, "dist", "report.js")).href);
  mkdirSync(out, { recursive: true });
  const folder = join(ROOT, "examples", "models");
  const results = [];
  for (const file of readdirSync(folder).filter((f) => f.endsWith(".json")).sort()) {
    const bytes = readFileSync(join(folder, file));
    const analysis = analyzeModel(parseModel(JSON.parse(bytes.toString("utf8"))));
    const name = basename(file, ".json");
    const html = join(out, `${name}.html`);
    const pdf = join(out, `${name}.pdf`);
    writeFileSync(html, calculationSheet(analysis, { input: { name: file, bytes: new Uint8Array(bytes) }, job: { project: "flexura examples" } }));
    printToPdf(html, pdf);
    const pages = pageCount(pdf);
    execFileSync("pdftoppm", ["-r", "110", "-png", pdf, join(out, name)], { stdio: "ignore" });
    const pngs = readdirSync(out).filter((f) => f.startsWith(`${name}-`) && f.endsWith(".png")).map((f) => join(out, f));
    results.push({ model: file, html, pdf, pages, pngs });
  }
  return results;
}

if (process.argv[1] !== undefined && resolve(process.argv[1]) === resolve(import.meta.filename)) {
  const results = await renderExampleSheets(process.argv[2] === undefined ? undefined : resolve(process.argv[2]));
  for (const r of results) console.log(`${r.model}: ${r.pages} page(s), ${r.pngs.length} PNG(s) -> ${r.pdf}`);
}
