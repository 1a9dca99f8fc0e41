import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { section, type SectionPart } from "../../src/section/index.js";
import { sectionPartStresses } from "../../src/stress/index.js";
import { simpson } from "./helpers.js";

const layer = fc.record({
  b: fc.double({ min: 10, max: 300, noNaN: true }),
  h: fc.double({ min: 5, max: 200, noNaN: true }),
  e: fc.double({ min: 1_000, max: 200_000, noNaN: true }),
});

describe("multi-material laws", () => {
  test.prop([fc.array(layer, { minLength: 1, maxLength: 4 }), fc.double({ min: -1e8, max: 1e8, noNaN: true })], { numRuns: 100 })(
    "the stress in every material, integrated over the actual parts, has zero axial force and the applied moment",
    (layers, m) => {
      let y = 0;
      const parts: SectionPart[] = layers.map((l) => {
        const p: SectionPart = {
          kind: "polygon",
          points: [
            { z: 0, y },
            { z: l.b, y },
            { z: l.b, y: y + l.h },
            { z: 0, y: y + l.h },
          ],
          material: { elasticModulus: l.e },
        };
        y += l.h;
        return p;
      });
      const r = sectionPartStresses(m, section(parts));
      let force = 0;
      let moment = 0;
      r.parts.forEach((p, i) => {
        const width = layers[i]!.b;
        const sigma = (yy: number): number => p.stressBottom + ((p.stressTop - p.stressBottom) * (yy - p.yBottom)) / (p.yTop - p.yBottom);
        force += simpson((yy) => sigma(yy) * width, p.yBottom, p.yTop);
        moment += simpson((yy) => -sigma(yy) * yy * width, p.yBottom, p.yTop);
      });
      const depth = y;
      expect(Math.abs(force) * depth).toBeLessThanOrEqual(1e-8 * Math.abs(m) + 1e-300);
      expect(Math.abs(moment - m)).toBeLessThanOrEqual(1e-8 * Math.abs(m) + 1e-300);
    },
  );
});
