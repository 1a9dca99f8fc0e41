// A small app as a bundler user writes it: bare imports of the package and its subpaths, bundled into one file.
import * as flexura from "flexura";
import * as model from "flexura/model";
import * as report from "flexura/report";
import * as section from "flexura/section";
import { runScenario } from "../page/scenario.js";

const out = document.getElementById("results");
try {
  out.textContent = JSON.stringify(runScenario({ flexura, model, report, section }));
  document.body.dataset.state = "done";
} catch (error) {
  out.textContent = String(error && error.stack ? error.stack : error);
  document.body.dataset.state = "failed";
}
