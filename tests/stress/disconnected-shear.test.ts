import { describe, expect, it } from "vitest";
import { builtUp, rectangle, translateSection } from "../../src/section/index.js";
import { sectionPeakShearStress, trySectionPeakShearStress, trySectionShearStressAt, trySectionShearStressProfile } from "../../src/stress/index.js";
import { solveBeam } from "../../src/beam/index.js";
import { checkMember, memberSection, memberStresses, tryCheckMember } from "../../src/check/index.js";
import { analyzeModel, parseModel } from "../../src/model/index.js";

// Invented: two 100 x 100 blocks stacked with a 20 mm gap between them (mm, N).
const gapped = builtUp([rectangle({ width: 100, depth: 100 }), translateSection(rectangle({ width: 100, depth: 100 }), { y: 120, z: 0 })]);

describe("shear stress on a section in separate pieces", () => {
  it("sectionPeakShearStress(two blocks with a gap) is refused with section-not-connected, not a zero in the gap", () => {
    for (const r of [trySectionPeakShearStress(1e4, gapped), trySectionShearStressProfile(1e4, gapped), trySectionShearStressAt(1e4, gapped, 0)]) {
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.error.issues.map((i) => [i.code, i.path, i["pieces"]])).toEqual([["section-not-connected", ["parts"], [[0], [1]]]]);
    }
    // blocks that meet only at a corner are separate pieces too
    const corner = builtUp([rectangle({ width: 100, depth: 100 }), translateSection(rectangle({ width: 100, depth: 100 }), { y: 100, z: 100 })]);
    expect(trySectionPeakShearStress(1, corner).ok).toBe(false);
    // closing the gap joins them: one 100 x 200 rectangle, 1.5 V / A (common practice)
    const joined = builtUp([rectangle({ width: 100, depth: 100 }), translateSection(rectangle({ width: 100, depth: 100 }), { y: 100, z: 0 })]);
    expect(sectionPeakShearStress(1e4, joined).stress).toBeCloseTo((1.5 * 1e4) / (100 * 200), 12);
  });

  it("memberStresses(section in pieces) gives bending and no shear; a shear limit is refused with the section's code", () => {
    const ms = memberSection(gapped);
    const solution = solveBeam({ length: 3000, stiffness: 1e13, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 3000 }], loads: [{ kind: "point", at: 1500, value: 1e4 }] });
    const s = memberStresses(solution, ms);
    expect(s.shear).toBeNull();
    expect(s.tension.stress).toBeGreaterThan(0);
    expect(checkMember(solution, ms, { bendingStress: 100 }).checks.map((c) => c.check)).toEqual(["bending-tension", "bending-compression"]);
    const r = tryCheckMember(solution, ms, { shearStress: 1 });
    expect(r.ok || r.error.issues.map((i) => [i.code, i.path])).toEqual([["section-not-connected", ["sections", "shear", "parts"]]]);
  });

  it("analyzeModel(built-up section in pieces) warns section-not-connected and gives no shear stress", () => {
    const file = {
      units: { system: "siNewtonMillimetre" },
      length: 3000,
      E: 10_000,
      section: {
        shape: "built-up",
        parts: [
          { type: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 100 }, { y: 100, z: 100 }, { y: 100, z: 0 }] },
          { type: "polygon", points: [{ y: 120, z: 0 }, { y: 120, z: 100 }, { y: 220, z: 100 }, { y: 220, z: 0 }] },
        ],
      },
      supports: [{ at: 0, type: "pin" }, { at: 3000, type: "roller" }],
      loads: [{ type: "point", at: 1500, value: 1e4 }],
    };
    const a = analyzeModel(parseModel(file));
    expect(a.warnings.map((w) => w.code)).toContain("section-not-connected");
    expect(a.stress?.shear).toBeUndefined();
    expect(a.stress?.tension.value).toBeGreaterThan(0);
  });
});
