import * as flexura from "flexura";
import * as model from "flexura/model";
import * as report from "flexura/report";
import * as section from "flexura/section";
import { runScenario } from "./scenario.js";

const out = document.getElementById("results");
try {
  const results = runScenario({ flexura, model, report, section });
  out.textContent = JSON.stringify(results);
  const holder = document.getElementById("diagrams");
  for (const svg of results.svgs) holder.insertAdjacentHTML("beforeend", svg);
  document.body.dataset.state = "done";
} catch (error) {
  out.textContent = String(error && error.stack ? error.stack : error);
  document.body.dataset.state = "failed";
}
