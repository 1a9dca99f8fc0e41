// A member-checking form on the published ESM files: every keystroke rebuilds the model, analyses it and
// redraws the results, the checks and the diagrams. Bad input shows the model reader's own messages.
import { formatPath } from "flexura";
import { analyzeModel, tryParseModel } from "flexura/model";
import { REPORT_CAUTION, formatReportNumber, reportDiagrams } from "flexura/report";
import { FIELDS, memberModel } from "./model.js";

const form = document.getElementById("member");
for (const field of FIELDS) {
  const label = document.createElement("label");
  label.htmlFor = field.name;
  label.textContent = field.label;
  const input = document.createElement("input");
  Object.assign(input, { id: field.name, name: field.name, value: field.value, inputMode: "decimal" });
  const unit = document.createElement("span");
  unit.className = "unit";
  unit.textContent = field.unit;
  form.append(label, input, unit);
}
document.getElementById("caution").textContent = REPORT_CAUTION;

const cell = (text, className) => {
  const td = document.createElement("td");
  td.textContent = text;
  if (className) td.className = className;
  return td;
};

function show(analysis) {
  const u = analysis.units;
  const rows = [
    ["Left reaction", analysis.reactions[0]?.force, u.force],
    ["Right reaction", analysis.reactions[1]?.force, u.force],
    ["Largest moment", analysis.moment.max.value, `${u.force}*${u.length}`],
    ["at", analysis.moment.max.at, u.length],
    ["Largest deflection", analysis.deflection.min.value, u.deflection],
  ];
  const results = document.querySelector("#results tbody");
  results.replaceChildren(
    ...rows.map(([name, value, unit]) => {
      const tr = document.createElement("tr");
      tr.dataset.result = name;
      tr.append(cell(name), cell(formatReportNumber(value ?? 0), "number"), cell(unit));
      return tr;
    }),
  );
  const checks = document.querySelector("#checks tbody");
  checks.replaceChildren(
    ...analysis.checks.map((c) => {
      const tr = document.createElement("tr");
      tr.dataset.check = c.kind;
      tr.append(
        cell(c.description),
        cell(`${formatReportNumber(c.demand)} ${c.unit}`, "number"),
        cell(`${formatReportNumber(c.capacity)} ${c.unit}`, "number"),
        cell(formatReportNumber(c.utilisation, 3), "number"),
        cell(c.pass ? "PASS" : "FAIL", c.pass ? "pass" : "fail"),
      );
      return tr;
    }),
  );
  const pass = analysis.checks.every((c) => c.pass);
  const verdict = document.getElementById("verdict");
  verdict.textContent = pass ? "The member passes every check." : "The member fails at least one check.";
  verdict.className = pass ? "pass" : "fail";
  const wanted = new Set(["member", "moment", "deflection", "section"]);
  document.getElementById("diagrams").innerHTML = reportDiagrams(analysis)
    .filter((d) => wanted.has(d.name))
    .map((d) => d.svg)
    .join("");
}

function update() {
  const values = Object.fromEntries(FIELDS.map((f) => [f.name, document.getElementById(f.name).value]));
  const parsed = tryParseModel(memberModel(values));
  const problems = document.getElementById("problems");
  let issues = parsed.ok ? [] : parsed.error.issues;
  if (parsed.ok) {
    try {
      show(analyzeModel(parsed.value));
    } catch (error) {
      issues = error && Array.isArray(error.issues) ? error.issues : [{ path: [], message: String(error) }];
    }
  }
  problems.replaceChildren(
    ...issues.map((i) => {
      const li = document.createElement("li");
      li.textContent = `${formatPath(i.path)}: ${i.message}`;
      return li;
    }),
  );
  document.getElementById("output").dataset.state = issues.length === 0 ? "ok" : "invalid";
  document.body.dataset.updates = String(Number(document.body.dataset.updates ?? 0) + 1);
}

form.addEventListener("input", update);
update();
