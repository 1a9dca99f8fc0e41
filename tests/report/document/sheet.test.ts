import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { analyzeModel, parseModel } from "../../../src/model/index.js";
import { calculationBook, calculationSheet, FLEXURA_VERSION, printedUnit, utilisationText } from "../../../src/report/index.js";
import { examples, ROOT } from "./helpers.js";

const SECTIONS = ["title-block", "figure", "inputs", "method", "results", "checks"];

/** References that would reach outside the document. */
function externalReferences(html: string): string[] {
  const out: string[] = [];
  for (const m of html.matchAll(/\b(?:src|href|xlink:href|action|poster|data)\s*=\s*"([^"]*)"/gi)) out.push(m[0]);
  for (const m of html.matchAll(/url\(|@import|<link\b|<script\b|<iframe\b|<object\b|<embed\b|<img\b/gi)) out.push(m[0]);
  return out;
}

describe("calculationSheet", () => {
  it("has every section, the caution, the program version and the input's SHA-256 (node:crypto as the reference), and nothing external", () => {
    for (const e of examples()) {
      const html = calculationSheet(e.analysis, { input: { name: e.file, bytes: readFileSync(join(ROOT, "examples", "models", e.file)) } });
      for (const id of SECTIONS) expect(html, `${e.file}: ${id}`).toMatch(new RegExp(`id="${id}"`));
      expect(externalReferences(html)).toEqual([]);
      expect(html).toContain(`flexura ${FLEXURA_VERSION}`);
      expect(html).toContain(createHash("sha256").update(readFileSync(join(ROOT, "examples", "models", e.file))).digest("hex"));
      expect(html).toContain(e.file);
      expect(html).toContain("Local codes govern.");
      expect(html).toMatch(/Euler–Bernoulli/);
      expect(html.match(/<section class="member">/g)).toHaveLength(1);
    }
  });

  it("keeps its printed version equal to package.json's", () => {
    const pkg = JSON.parse(readFileSync(join(ROOT, "package.json"), "utf8")) as { version: string };
    expect(FLEXURA_VERSION).toBe(pkg.version);
  });

  it("escapes markup and script text in job fields and names, never executing it", () => {
    const [first] = examples();
    const hostile = "<script>alert(1)</script>";
    const attribute = '"><img src=x onerror=alert(1)>';
    const html = calculationSheet(first!.analysis, { job: { project: hostile, engineer: attribute, member: attribute, checker: "A & B" }, input: { name: hostile, bytes: "{}" } });
    expect(externalReferences(html)).toEqual([]);
    expect(html).not.toContain("<script");
    expect(html).not.toContain("<img");
    expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
    expect(html).toContain("&quot;&gt;&lt;img src=x onerror=alert(1)&gt;");
    expect(html).toContain("A &amp; B");
  });

  it("shortens a very long name with a footnote that keeps the full text", () => {
    const [first] = examples();
    const long = `Member ${"very long name ".repeat(20)}end`;
    const html = calculationSheet(first!.analysis, { job: { member: long } });
    expect(html).toMatch(/…<sup>1<\/sup>/);
    expect(html).toContain(`<section class="notes" id="notes"><h2>Notes</h2><ol><li>${long}</li></ol>`);
  });

  it("shows blank title-block fields when the job gives none", () => {
    const [first] = examples();
    const html = calculationSheet(first!.analysis);
    expect(html).toMatch(/data-field="engineer">&nbsp;</);
    expect(html).toMatch(/data-field="sha-256">&nbsp;</);
  });

  it("states the verdict with the right number agreement and says NOT CHECKED when there are no limits", () => {
    const base = { format: 1, length: 6, E: 200000, I: 8e7, supports: [{ type: "pin", at: 0 }, { type: "roller", at: 6 }], loads: [{ type: "point", at: 3, value: 10 }] };
    const none = calculationSheet(analyzeModel(parseModel(base)));
    expect(none).toContain('data-verdict="not-checked"');
    expect(none).not.toContain('data-verdict="pass"');
    const one = calculationSheet(analyzeModel(parseModel({ ...base, limits: { deflection: "span/360" } })));
    expect(one).toContain("the one check passes");
    expect(one).not.toMatch(/all 1 checks/);
    // PL^3/(48 EI) = 10 * 6^3 / (48 * 200e6 kPa * 8e-5 m^4) = 2.8125 mm (AISC Manual Table 3-23 case 7, from memory) against 6000/5000 = 1.2 mm: 2.34.
    const fail = calculationSheet(analyzeModel(parseModel({ ...base, limits: { deflection: "span/5000" } })));
    expect(fail).toContain('data-verdict="fail"');
    expect(fail).toContain("the one check fails");
    expect(fail).toContain("<td>2.34</td>");
  });

  it("prints utilisation to three significant figures, trailing zeros kept", () => {
    expect(utilisationText(1.196)).toBe("1.20");
    expect(utilisationText(0.90312)).toBe("0.903");
    expect(utilisationText(0.0123456)).toBe("0.0123");
    expect(utilisationText(12.345)).toBe("12.3");
    expect(utilisationText(0)).toBe("0.00");
    expect(utilisationText(4321.6)).toBe("4322");
  });

  it("prints units with a middle dot and superscripts, or plain on request", () => {
    expect(printedUnit("kN*m")).toBe("kN·m");
    expect(printedUnit("mm^4")).toBe("mm⁴");
    expect(printedUnit("kip*ft^-1")).toBe("kip·ft⁻¹");
    expect(printedUnit("kN*m", true)).toBe("kN*m");
    const [first] = examples();
    expect(calculationSheet(first!.analysis, { plainUnits: true })).not.toContain("·m");
  });

  it("puts several members on their own pages", () => {
    const list = examples();
    const html = calculationBook(list.map((e) => ({ analysis: e.analysis, options: { input: { name: e.file, bytes: e.text } } })), { paper: "letter" });
    expect(html.match(/<section class="member">/g)).toHaveLength(list.length);
    expect(html).toContain("@page{size:letter");
    expect(html).toMatch(/\.member\{break-after:page/);
  });

  it("writes a 2,000-span member in under a second, simplified, with a summary and every reaction in the table", () => {
    const supports = Array.from({ length: 2001 }, (_, i) => ({ type: i === 0 ? "pin" : "roller", at: i }));
    const analysis = analyzeModel(parseModel({ format: 1, length: 2000, E: 200000, I: 8e7, supports, loads: [{ type: "distributed", from: 0, to: 2000, start: 5, end: 5 }] }));
    const start = performance.now();
    const html = calculationSheet(analysis);
    const elapsed = performance.now() - start;
    expect(elapsed).toBeLessThan(1000);
    expect(html).toContain('data-flag="figure-simplified"');
    expect(html).toMatch(/2001 supports; largest upward reaction/);
    // 2,000 rollers in the supports table and 2,000 in the reactions table.
    expect(html.match(/<td>roller<\/td>/g)?.length).toBe(4000);
  });
});

describe("textReport header", () => {
  it("names the program version and the input file with its SHA-256", async () => {
    const { textReport } = await import("../../../src/report/index.js");
    const [first] = examples();
    const text = textReport(first!.analysis, { input: { name: first!.file, bytes: first!.text } });
    expect(text).toContain(`Program: flexura ${FLEXURA_VERSION}`);
    expect(text).toContain(`Input: ${first!.file} (SHA-256 ${createHash("sha256").update(first!.text, "utf8").digest("hex")})`);
  });
});
