// Property tests run from a fixed seed so that a CI run is reproducible; set FLEXURA_PROPERTY_SEED
// to another integer (or to "random") to explore further locally. A failure prints its seed and
// counterexample either way.
import fc from "fast-check";

const requested = process.env["FLEXURA_PROPERTY_SEED"];
if (requested !== "random") {
  const seed = requested === undefined ? 20261202 : Number.parseInt(requested, 10);
  fc.configureGlobal({ seed: Number.isFinite(seed) ? seed : 20261202 });
}
