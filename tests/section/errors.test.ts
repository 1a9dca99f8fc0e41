import { describe, expect, it } from "vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import {
  firstMomentAbove,
  iSection,
  pipe,
  rectangle,
  section,
  sectionProperties,
  tee,
  trySection,
  trySectionProperties,
  tryFirstMomentAbove,
  type Section,
  type SectionPart,
} from "../../src/section/index.js";

const square = (z0: number, y0: number, size: number, extra: Partial<SectionPart> = {}): SectionPart =>
  ({
    kind: "polygon",
    points: [
      { y: y0, z: z0 },
      { y: y0, z: z0 + size },
      { y: y0 + size, z: z0 + size },
      { y: y0 + size, z: z0 },
    ],
    ...extra,
  }) as SectionPart;

function issuesOf(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    if (isFlexuraError(e)) return e.issues.map((i) => ({ code: i.code, path: i.path.join(".") }));
    throw e;
  }
  return "no error";
}

describe("section(bad input)", () => {
  it("section([]) is section-empty", () => {
    expect(issuesOf(() => section([]))).toMatchInlineSnapshot(`
      [
        {
          "code": "section-empty",
          "path": "parts",
        },
      ]
    `);
  });

  it("section(polygon with two distinct points) is polygon-degenerate", () => {
    const r = trySection([{ kind: "polygon", points: [{ y: 0, z: 0 }, { y: 1, z: 1 }, { y: 0, z: 0 }] }]);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatchInlineSnapshot(`"parts[0].points: A polygon needs at least three distinct points; got 2. [polygon-degenerate]"`);
  });

  it("section(collinear polygon) is polygon-degenerate", () => {
    expect(issuesOf(() => section([{ kind: "polygon", points: [{ y: 0, z: 0 }, { y: 1, z: 1 }, { y: 2, z: 2 }] }]))).toMatchInlineSnapshot(`
      [
        {
          "code": "polygon-degenerate",
          "path": "parts.0.points",
        },
      ]
    `);
  });

  it("section(bow-tie polygon) is polygon-self-intersecting", () => {
    const bowTie: SectionPart = { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 10 }, { y: 10, z: 0 }, { y: 10, z: 10 }] };
    expect(issuesOf(() => section([bowTie]))).toMatchInlineSnapshot(`
      [
        {
          "code": "polygon-self-intersecting",
          "path": "parts.0.points",
        },
      ]
    `);
  });

  it("section(polygon that folds back along an edge) is polygon-self-intersecting", () => {
    const spike: SectionPart = { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 10 }, { y: 0, z: 20 }, { y: 0, z: 15 }, { y: 10, z: 10 }] };
    expect(issuesOf(() => section([spike]))).toMatchInlineSnapshot(`
      [
        {
          "code": "polygon-self-intersecting",
          "path": "parts.0.points",
        },
      ]
    `);
  });

  it("section(polygon touching itself at a corner) is polygon-self-intersecting", () => {
    const pinched: SectionPart = {
      kind: "polygon",
      points: [{ y: 0, z: 0 }, { y: 0, z: 10 }, { y: 5, z: 5 }, { y: 10, z: 10 }, { y: 10, z: 0 }, { y: 5, z: 5 }],
    };
    expect(issuesOf(() => section([pinched]))).toMatchInlineSnapshot(`
      [
        {
          "code": "polygon-self-intersecting",
          "path": "parts.0.points",
        },
      ]
    `);
  });

  it("section(hole poking out of its plate) is hole-outside-solid", () => {
    const s = [square(0, 0, 10), { kind: "circle", centre: { y: 5, z: 9 }, radius: 3, hole: true } as const];
    const r = trySection(s);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues[0]).toMatchObject({ code: "hole-outside-solid", path: ["parts", 1] });
  });

  it("section(only holes) is section-no-solid", () => {
    expect(issuesOf(() => section([square(0, 0, 1, { hole: true })]))).toMatchInlineSnapshot(`
      [
        {
          "code": "section-no-solid",
          "path": "parts",
        },
      ]
    `);
  });

  it("section(hole as large as its plate) is section-area-not-positive", () => {
    expect(issuesOf(() => section([square(0, 0, 10), square(0, 0, 10, { hole: true })]))).toMatchInlineSnapshot(`
      [
        {
          "code": "section-area-not-positive",
          "path": "parts",
        },
      ]
    `);
  });

  it("section collects every problem at once, with paths", () => {
    const parts = [
      { kind: "circle", centre: { y: Number.NaN, z: 0 }, radius: -2 },
      { kind: "sector", centre: { y: 0, z: 0 }, radius: 1, startAngle: 0, sweep: 7 },
      { kind: "fillet", corner: "here", radius: 0, orientation: 0 },
      { kind: "ellipse" },
      { kind: "polygon", points: "none" },
      { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 1 }, { y: 1 }], hole: "yes" },
      square(0, 0, 1, { material: { elasticModulus: 0, yieldStrength: -1, name: 3 } as never }),
      42,
    ] as unknown as SectionPart[];
    expect(issuesOf(() => section(parts))).toMatchInlineSnapshot(`
      [
        {
          "code": "not-finite",
          "path": "parts.0.centre.y",
        },
        {
          "code": "dimension-not-positive",
          "path": "parts.0.radius",
        },
        {
          "code": "sector-sweep-out-of-range",
          "path": "parts.1.sweep",
        },
        {
          "code": "point-invalid",
          "path": "parts.2.corner",
        },
        {
          "code": "dimension-not-positive",
          "path": "parts.2.radius",
        },
        {
          "code": "part-kind-unknown",
          "path": "parts.3.kind",
        },
        {
          "code": "polygon-degenerate",
          "path": "parts.4.points",
        },
        {
          "code": "part-invalid",
          "path": "parts.5.hole",
        },
        {
          "code": "not-a-number",
          "path": "parts.5.points.2.z",
        },
        {
          "code": "elastic-modulus-not-positive",
          "path": "parts.6.material.elasticModulus",
        },
        {
          "code": "yield-strength-not-positive",
          "path": "parts.6.material.yieldStrength",
        },
        {
          "code": "material-invalid",
          "path": "parts.6.material.name",
        },
        {
          "code": "part-invalid",
          "path": "parts.7",
        },
      ]
    `);
  });

  it("section(some parts with a material, some without) is material-missing", () => {
    const steel = { elasticModulus: 200e3 };
    expect(issuesOf(() => section([square(0, 0, 1, { material: steel }), square(2, 0, 1)]))).toMatchInlineSnapshot(`
      [
        {
          "code": "material-missing",
          "path": "parts.1.material",
        },
      ]
    `);
  });

  it("section(not a list) and sectionProperties(not a section) are typed errors", () => {
    expect(issuesOf(() => section("x" as never))).toMatchInlineSnapshot(`
      [
        {
          "code": "section-invalid",
          "path": "parts",
        },
      ]
    `);
    expect(issuesOf(() => sectionProperties(null as unknown as Section))).toMatchInlineSnapshot(`
      [
        {
          "code": "section-invalid",
          "path": "",
        },
      ]
    `);
    expect(trySectionProperties({ parts: [] }).ok).toBe(false);
  });
});

describe("shapes(bad dimensions)", () => {
  it("rectangle(negative width) is dimension-not-positive", () => {
    expect(issuesOf(() => rectangle({ width: -1, depth: Number.POSITIVE_INFINITY }))).toMatchInlineSnapshot(`
      [
        {
          "code": "dimension-not-positive",
          "path": "width",
        },
        {
          "code": "not-finite",
          "path": "depth",
        },
      ]
    `);
  });

  it("iSection(flanges as deep as the section) is flange-too-thick; web wider than a flange is web-too-thick", () => {
    expect(issuesOf(() => iSection({ depth: 20, flangeWidth: 100, flangeThickness: 10, webThickness: 120 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "flange-too-thick",
          "path": "flangeThickness",
        },
        {
          "code": "web-too-thick",
          "path": "webThickness",
        },
      ]
    `);
  });

  it("iSection(root radius that does not fit) is root-radius-too-large", () => {
    expect(issuesOf(() => iSection({ depth: 200, flangeWidth: 100, flangeThickness: 10, webThickness: 6, rootRadius: 50 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "root-radius-too-large",
          "path": "rootRadius",
        },
      ]
    `);
    expect(issuesOf(() => iSection({ depth: 200, flangeWidth: 100, flangeThickness: 10, webThickness: 6, rootRadius: -1, bottomFlangeWidth: 0 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "dimension-not-positive",
          "path": "bottomFlangeWidth",
        },
        {
          "code": "dimension-negative",
          "path": "rootRadius",
        },
      ]
    `);
  });

  it("tee and pipe check their proportions", () => {
    expect(issuesOf(() => tee({ depth: 10, flangeWidth: 5, flangeThickness: 10, webThickness: 6 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "flange-too-thick",
          "path": "flangeThickness",
        },
        {
          "code": "web-too-thick",
          "path": "webThickness",
        },
      ]
    `);
    expect(issuesOf(() => tee({ depth: 100, flangeWidth: 50, flangeThickness: 10, webThickness: 6, rootRadius: 30 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "root-radius-too-large",
          "path": "rootRadius",
        },
      ]
    `);
    expect(issuesOf(() => pipe({ outsideDiameter: 10, wallThickness: 5 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "wall-too-thick",
          "path": "wallThickness",
        },
      ]
    `);
    expect(issuesOf(() => rectangle(null as never))).toMatchInlineSnapshot(`
      [
        {
          "code": "dimensions-invalid",
          "path": "",
        },
      ]
    `);
  });
});

describe("property functions(bad options)", () => {
  it("sectionProperties(referenceModulus 0) is reference-modulus-not-positive", () => {
    expect(issuesOf(() => sectionProperties(rectangle({ width: 1, depth: 1 }), { referenceModulus: 0 }))).toMatchInlineSnapshot(`
      [
        {
          "code": "reference-modulus-not-positive",
          "path": "referenceModulus",
        },
      ]
    `);
  });
  it("firstMomentAbove(NaN) is not-finite", () => {
    expect(issuesOf(() => firstMomentAbove(rectangle({ width: 1, depth: 1 }), Number.NaN))).toMatchInlineSnapshot(`
      [
        {
          "code": "not-finite",
          "path": "yCut",
        },
      ]
    `);
    expect(tryFirstMomentAbove(rectangle({ width: 1, depth: 1 }), 0).ok).toBe(true);
  });
});
