// Generators of valid sections for the property tests.
import { fc } from "@fast-check/vitest";
import type { SectionPart, SectionPoint } from "../../src/section/index.js";

/** A star-shaped polygon around a centre, either winding; every angular gap is under pi, so it is simple. */
export const starPolygon = (spread = 100): fc.Arbitrary<SectionPart> =>
  fc
    .record({
      cz: fc.double({ min: -spread, max: spread, noNaN: true }),
      cy: fc.double({ min: -spread, max: spread, noNaN: true }),
      rays: fc.array(fc.record({ gap: fc.double({ min: 0.6, max: 1, noNaN: true }), radius: fc.double({ min: 1, max: 50, noNaN: true }) }), { minLength: 3, maxLength: 12 }),
      clockwise: fc.boolean(),
    })
    .map(({ cz, cy, rays, clockwise }) => {
      const total = rays.reduce((s, r) => s + r.gap, 0);
      let angle = 0;
      const points: SectionPoint[] = rays.map((r) => {
        angle += (r.gap / total) * 2 * Math.PI;
        return { y: cy + r.radius * Math.sin(angle), z: cz + r.radius * Math.cos(angle) };
      });
      if (clockwise) points.reverse();
      return { kind: "polygon", points } as const;
    });

/** A circle, a sector or a fillet somewhere near the origin. */
export const roundPart = (spread = 100): fc.Arbitrary<SectionPart> =>
  fc.oneof(
    fc.record({ y: fc.double({ min: -spread, max: spread, noNaN: true }), z: fc.double({ min: -spread, max: spread, noNaN: true }), r: fc.double({ min: 1, max: 40, noNaN: true }) }).map(
      ({ y, z, r }): SectionPart => ({ kind: "circle", centre: { y, z }, radius: r }),
    ),
    fc
      .record({
        y: fc.double({ min: -spread, max: spread, noNaN: true }),
        z: fc.double({ min: -spread, max: spread, noNaN: true }),
        r: fc.double({ min: 1, max: 40, noNaN: true }),
        start: fc.double({ min: -7, max: 7, noNaN: true }),
        sweep: fc.double({ min: 0.1, max: 2 * Math.PI, noNaN: true }),
      })
      .map(({ y, z, r, start, sweep }): SectionPart => ({ kind: "sector", centre: { y, z }, radius: r, startAngle: start, sweep })),
    fc
      .record({ y: fc.double({ min: -spread, max: spread, noNaN: true }), z: fc.double({ min: -spread, max: spread, noNaN: true }), r: fc.double({ min: 1, max: 40, noNaN: true }), o: fc.double({ min: -7, max: 7, noNaN: true }) })
      .map(({ y, z, r, o }): SectionPart => ({ kind: "fillet", corner: { y, z }, radius: r, orientation: o })),
  );

/** Any single part. */
export const anyPart = (spread = 100): fc.Arbitrary<SectionPart> => fc.oneof(starPolygon(spread), roundPart(spread));

/** Relative closeness with a scale for values that may be near zero. */
export function near(actual: number, expected: number, scale: number, rel = 1e-9): boolean {
  return Math.abs(actual - expected) <= rel * Math.max(Math.abs(expected), scale);
}

/** A rectangle from (z0, y0) to (z1, y1) as a polygon part, solid or a hole (test fixtures). */
export function boxPart(z0: number, y0: number, z1: number, y1: number, hole = false): SectionPart {
  return {
    kind: "polygon",
    points: [
      { y: y0, z: z0 },
      { y: y0, z: z1 },
      { y: y1, z: z1 },
      { y: y1, z: z0 },
    ],
    ...(hole ? { hole: true } : {}),
  };
}
