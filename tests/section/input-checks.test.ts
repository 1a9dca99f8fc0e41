import { describe, expect, it } from "vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import {
  iSection,
  mirrorPart,
  mirrorSection,
  plateGirder,
  rectangle,
  rotatePart,
  rotateSection,
  section,
  tee,
  translatePart,
  translateSection,
  tryISection,
  type MirrorAxis,
  type SectionPart,
  type SectionPoint,
} from "../../src/section/index.js";

function issuesOf(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    if (isFlexuraError(e)) return e.issues.map((i) => ({ code: i.code, path: i.path.join("."), ...(i.message.includes("Did you mean") ? { hint: i.message.slice(i.message.indexOf("Did you mean")) } : {}) }));
    throw e;
  }
  return "no error";
}

const disc: SectionPart = { kind: "circle", centre: { y: 0, z: 0 }, radius: 5 };

describe("mirror axes: only the section plane's own", () => {
  it("mirrorSection(s, 'x') and mirrorSection(s, 5) are refused, not taken as some other axis", () => {
    const t = tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 });
    expect(issuesOf(() => mirrorSection(t, "x" as MirrorAxis))).toEqual([{ code: "mirror-axis-invalid", path: "axis" }]);
    expect(issuesOf(() => mirrorSection(t, 5 as unknown as MirrorAxis))).toEqual([{ code: "mirror-axis-invalid", path: "axis" }]);
    expect(issuesOf(() => mirrorPart(disc, "Y" as MirrorAxis))).toEqual([{ code: "mirror-axis-invalid", path: "axis" }]);
    expect(issuesOf(() => mirrorPart(disc, undefined as unknown as MirrorAxis))).toEqual([{ code: "mirror-axis-invalid", path: "axis" }]);
    // the two real axes still work: "z" turns the tee upside down (common practice: y -> -y)
    const flipped = mirrorSection(t, "z");
    expect(flipped.parts[0]?.kind).toBe("polygon");
  });
});

describe("moving parts: offsets, angles and centres are numbers", () => {
  it("translatePart with a numeric string offset is refused (it once joined the strings)", () => {
    const by = { y: "5", z: 0 } as unknown as SectionPoint;
    expect(issuesOf(() => translatePart(disc, by))).toEqual([{ code: "not-a-number", path: "by.y" }]);
    expect(issuesOf(() => translateSection(rectangle({ width: 10, depth: 20 }), by))).toEqual([{ code: "not-a-number", path: "by.y" }]);
    expect(issuesOf(() => translatePart(disc, null as unknown as SectionPoint))).toEqual([{ code: "point-invalid", path: "by" }]);
  });

  it("rotations refuse a non-finite angle or a bad centre; a bad part gets its codes, not a raw TypeError", () => {
    expect(issuesOf(() => rotatePart(disc, Number.NaN))).toEqual([{ code: "not-finite", path: "angle" }]);
    expect(issuesOf(() => rotateSection(rectangle({ width: 10, depth: 20 }), 1, { y: 0 } as SectionPoint))).toEqual([{ code: "not-a-number", path: "about.z" }]);
    expect(issuesOf(() => translatePart({ kind: "polygon" } as unknown as SectionPart, { y: 1, z: 1 }))).toEqual([{ code: "polygon-degenerate", path: "part.points" }]);
    expect(issuesOf(() => mirrorSection({ parts: 3 } as never, "y"))).toEqual([{ code: "section-invalid", path: "" }]);
  });
});

describe("misspelt names are refused with the closest name", () => {
  it("iSection({ rootradius }) is refused, suggesting rootRadius (it once built sharp corners)", () => {
    const dims = { depth: 310, flangeWidth: 165, flangeThickness: 9.7, webThickness: 5.8, rootradius: 8.9 };
    expect(issuesOf(() => iSection(dims as never))).toEqual([{ code: "unknown-field", path: "rootradius", hint: 'Did you mean "rootRadius"?' }]);
    const r = tryISection(dims);
    expect(r.ok).toBe(false);
  });

  it("an unknown option, plate key, part field or material field is refused", () => {
    expect(issuesOf(() => rectangle({ width: 1, depth: 2 }, { materail: { elasticModulus: 1 } } as never))).toEqual([
      { code: "unknown-field", path: "options.materail", hint: 'Did you mean "material"?' },
    ]);
    expect(issuesOf(() => rectangle({ width: 1, depth: 2 }, 5 as never))).toEqual([{ code: "options-invalid", path: "options" }]);
    expect(
      issuesOf(() => plateGirder({ topFlange: { width: 400, thickness: 30 }, web: { width: 1500, thickness: 12 }, bottomFlang: { width: 1, thickness: 1 } } as never)),
    ).toEqual([{ code: "unknown-field", path: "bottomFlang", hint: 'Did you mean "bottomFlange"?' }]);
    expect(issuesOf(() => plateGirder({ topFlange: { width: 400, thicknes: 30 }, web: { width: 1500, thickness: 12 } } as never))).toEqual([
      { code: "unknown-field", path: "topFlange.thicknes", hint: 'Did you mean "thickness"?' },
      { code: "not-a-number", path: "topFlange.thickness" },
    ]);
    expect(issuesOf(() => section([{ ...disc, hol: true } as never]))).toEqual([{ code: "unknown-field", path: "parts.0.hol", hint: 'Did you mean "hole"?' }]);
    expect(issuesOf(() => section([{ ...disc, material: { elasticModulus: 1, yieldStrenght: 2 } } as never]))).toEqual([
      { code: "unknown-field", path: "parts.0.material.yieldStrenght", hint: 'Did you mean "yieldStrength"?' },
    ]);
    expect(issuesOf(() => rectangle({ width: 1, depth: 2, colour: "red" } as never))).toEqual([{ code: "unknown-field", path: "colour" }]);
  });
});
