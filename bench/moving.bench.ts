// Influence lines and moving loads on an invented two-span runway girder (kN, m): 6 m + 6 m,
// continuous over the middle support, E I 42,000 kN m^2.
import { bench, suite } from "./harness.js";
import type { BeamInput } from "../src/beam/index.js";
import { influenceLine, memberInfluence } from "../src/moving/index.js";

export const GIRDER: BeamInput = {
  length: 12,
  stiffness: 42_000,
  supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 12 }],
};

const prepared = memberInfluence(GIRDER);

suite("moving", () => {
  bench("moving: memberInfluence (two spans: every reaction's line)", () => memberInfluence(GIRDER));
  bench("moving: influenceLine of the moment at 2.4 m (member prepared)", () => influenceLine(prepared, { kind: "moment", at: 2.4 }));
  bench("moving: influenceLine of the deflection at 3 m (one solve)", () => influenceLine(prepared, { kind: "deflection", at: 3 }));
});
