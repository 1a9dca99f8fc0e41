import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  builtUp,
  channel,
  circle,
  connectedPieces,
  iSection,
  pipe,
  rectangle,
  rectangularHollow,
  rotateSection,
  section,
  translateSection,
  tryConnectedPieces,
} from "../../src/section/index.js";

const block = (w: number, h: number, z: number, y: number) => translateSection(rectangle({ width: w, depth: h }), { y, z });

describe("connectedPieces", () => {
  it("connectedPieces(parts touching along an edge) is one piece; at a corner only, two", () => {
    expect(connectedPieces(builtUp([block(10, 10, 0, 0), block(10, 10, 0, 10)]))).toEqual([[0, 1]]);
    expect(connectedPieces(builtUp([block(10, 10, 0, 0), block(10, 10, 10, 10)]))).toEqual([[0], [1]]);
    // an edge shared over part of its length (a narrow stem under a wide flange) joins them
    expect(connectedPieces(builtUp([block(4, 10, 0, 0), block(30, 2, 0, 6)]))).toEqual([[0, 1]]);
  });

  it("connectedPieces(parts with a gap) lists each piece, whatever the order of the parts", () => {
    const s = builtUp([block(10, 10, 0, 0), block(10, 10, 0, 20), block(10, 10, 0, 10), block(10, 10, 40, 0)]);
    expect(connectedPieces(s)).toEqual([[0, 1, 2], [3]]);
    // a gap narrower than the tolerance is not a join either: 1e-6 of the depth apart
    expect(connectedPieces(builtUp([block(10, 10, 0, 0), block(10, 10, 0, 10 + 1e-5)]))).toEqual([[0], [1]]);
  });

  it("connectedPieces of the standard shapes is one piece (root fillets, rounded corners, holes)", () => {
    for (const s of [
      iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 7, rootRadius: 15 }),
      channel({ depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7, rootRadius: 12 }),
      rectangularHollow({ width: 100, depth: 200, wallThickness: 8, cornerRadius: 16, innerCornerRadius: 8 }),
      pipe({ outsideDiameter: 100, wallThickness: 5 }),
      rotateSection(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 7 }), 0.3),
    ]) {
      expect(connectedPieces(s)).toHaveLength(1);
    }
  });

  it("connectedPieces: a core filling a tube's bore is joined to the tube; a smaller core is not", () => {
    const steel = { elasticModulus: 200_000 };
    const concrete = { elasticModulus: 30_000 };
    const tube = (d: number) =>
      section([
        { kind: "circle", centre: { y: 0, z: 0 }, radius: 50, material: steel },
        { kind: "circle", centre: { y: 0, z: 0 }, radius: 45, hole: true },
        { kind: "circle", centre: { y: 0, z: 0 }, radius: d / 2, material: concrete },
      ]);
    expect(connectedPieces(tube(90))).toEqual([[0, 2]]);
    expect(connectedPieces(tube(80))).toEqual([[0], [2]]);
    // a circle on a plate touches it at one point only
    expect(connectedPieces(builtUp([block(100, 10, 0, 0), translateSection(circle({ diameter: 20 }), { y: 15, z: 0 })]))).toEqual([[0], [1]]);
  });

  test.prop([fc.integer({ min: 1, max: 6 }), fc.double({ min: 0.1, max: 5, noNaN: true }), fc.integer({ min: 0, max: 2 })], { numRuns: 40 })(
    "a stack of n blocks is one piece when each sits on the one below, n pieces with gaps or when they only meet at corners",
    (n, h, how) => {
      const blocks = Array.from({ length: n }, (_, i) => (how === 0 ? block(3, h, 0, i * h) : how === 1 ? block(3, h, 0, i * h * 1.5) : block(3, h, 3 * i, i * h)));
      const pieces = connectedPieces(builtUp(blocks));
      expect(pieces).toEqual(how === 0 ? [Array.from({ length: n }, (_, i) => i)] : Array.from({ length: n }, (_, i) => [i]));
    },
  );

  it("tryConnectedPieces(not a section) is a typed error", () => {
    const r = tryConnectedPieces({ parts: [] });
    expect(r.ok || r.error.code).toBe("section-empty");
  });
});
