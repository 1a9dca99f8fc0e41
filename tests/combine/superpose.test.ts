// Superposition: every combination formed from the solved cases equals a direct solve of the
// factored loads (and the settlement case's settlements times its factor). Linear elastic
// Euler-Bernoulli members obey superposition exactly, so only rounding may differ.
import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, type BeamInput } from "../../src/beam/index.js";
import type { Load } from "../../src/loads/index.js";
import { evaluatePiecewise, type PiecewisePolynomial } from "../../src/math/index.js";
import { combineCases, solveCases, type LoadCase } from "../../src/combine/index.js";
import { actionScale, arbMember, displacementScale, samplePoints } from "../beam/arbitraries.js";

const CASES: readonly LoadCase[] = [
  { name: "D", category: "dead" },
  { name: "L", category: "live", patterned: true },
  { name: "W", category: "wind", reversible: true },
  { name: "T", category: "user" },
];

/** The member with each load put in case D, L or W (by `picks`), and every case given a load. */
function withCases(beam: BeamInput, picks: readonly number[]): BeamInput {
  const names = ["D", "L", "W"];
  const loads = (beam.loads ?? []).map((l, i) => ({ ...l, case: names[(picks[i] ?? 0) % 3] as string }));
  for (const n of names) if (!loads.some((l) => l.case === n)) loads.push({ kind: "point", at: beam.length / 3, value: 1, case: n });
  return { ...beam, loads };
}

function size(pp: PiecewisePolynomial, xs: readonly number[]): number {
  let m = 0;
  for (const x of xs) m = Math.max(m, Math.abs(evaluatePiecewise(pp, x)));
  return m;
}

describe("combineCases(solveCases(...)) is superposition", () => {
  test.prop([arbMember({ settlements: true }), fc.array(fc.nat(), { minLength: 12, maxLength: 12 }), fc.array(fc.integer({ min: -2000, max: 2000 }).map((v) => v / 1000), { minLength: 4, maxLength: 4 }), fc.array(fc.boolean(), { minLength: 8, maxLength: 8 })], { numRuns: 80 })(
    "each diagram and reaction equals a direct solve of the factored loads to 1e-12 of the load scale",
    (member, picks, [fd, fl, fw, ft], spanBits) => {
      const beam = withCases(member, picks);
      const moves = beam.supports.some((s) => (s.settlement ?? 0) !== 0 || (s.rotation ?? 0) !== 0);
      const cases = moves ? CASES : CASES.slice(0, 3);
      const solved = solveCases(beam, cases, moves ? { settlementCase: "T" } : {});
      const loadedSpans = solved.spans.map((_, i) => i).filter((i) => spanBits[i % 8] === true);
      const factors: Record<string, number> = { D: fd!, L: fl!, W: fw! };
      if (moves) factors["T"] = ft!;
      const combined = combineCases(solved, factors, { L: loadedSpans });
      // the direct route: every load times its case's factor, live only on the loaded spans
      const factoredBeam: BeamInput = {
        ...beam,
        supports: beam.supports.map((s) => ({ ...s, ...(s.settlement !== undefined ? { settlement: s.settlement * (factors["T"] ?? 0) } : {}), ...(s.rotation !== undefined ? { rotation: s.rotation * (factors["T"] ?? 0) } : {}) })),
        loads: (beam.loads ?? []).flatMap((l): Load[] => {
          const f = factors[l.case as string] ?? 0;
          if (l.case !== "L") return l.kind === "distributed" ? [{ ...l, start: l.start * f, end: l.end * f }] : [{ ...l, value: l.value * f }];
          // a patterned load only where its span is loaded (cut at the supports)
          if (l.kind !== "distributed") {
            const own = solved.spans.findIndex((s, i) => l.at >= s.from && (l.at < s.to || (i === solved.spans.length - 1 && l.at <= s.to)));
            return solved.spans.length < 2 || loadedSpans.includes(own) ? [{ ...l, value: l.value * f }] : [];
          }
          return solved.spans.flatMap((s, i) => {
            const a = Math.max(l.from, s.from);
            const b = Math.min(l.to, s.to);
            if (!(b > a) || (solved.spans.length >= 2 && !loadedSpans.includes(i))) return [];
            const w = (x: number): number => l.start + ((l.end - l.start) * (x - l.from)) / (l.to - l.from);
            return [{ ...l, from: a, to: b, start: w(a) * f, end: w(b) * f }];
          });
        }),
      };
      const direct = solveBeam(factoredBeam);
      // the load scale of the factored member (its forces and moments, and what they make of
      // slope and deflection), plus, for settlements, the element end forces they impose, which
      // cancel in the results (12 E I d / h^3 over the shortest element h): the beam engine's own
      // rounding is relative to those, whichever route is taken
      const act = actionScale(factoredBeam, direct.reactions);
      const eis = typeof beam.stiffness === "number" ? [beam.stiffness] : beam.stiffness.map((s) => s.stiffness);
      const L = beam.length;
      const nodes = [0, L, ...beam.supports.map((s) => s.at), ...(beam.hinges ?? []), ...(typeof beam.stiffness === "number" ? [] : beam.stiffness.map((s) => s.from))].sort((a, b) => a - b);
      const h = Math.min(L, ...nodes.slice(1).map((x, i) => x - nodes[i]!).filter((d) => d > 0));
      const imposed = displacementScale(factoredBeam);
      const settleShear = (12 * Math.max(...eis) * imposed) / h ** 3;
      const eiMin = Math.min(...eis);
      const moment = act.moment + settleShear * L;
      const natural = { shear: act.force + settleShear, moment, slope: (moment * L) / eiMin + imposed / h, deflection: (moment * L * L) / eiMin + imposed * (L / h) };
      const xs = [...samplePoints(beam.length, 41), ...Array.from(solved.breaks)];
      for (const d of ["shear", "moment", "slope", "deflection"] as const) {
        let scale = natural[d];
        solved.solutions.forEach((s, p) => {
          const part = solved.parts[p]!;
          const w = Math.abs(factors[part.case] ?? 0);
          scale += w * size(s[d], xs);
        });
        for (const x of xs) {
          for (const side of ["left", "right"] as const) {
            expect(Math.abs(evaluatePiecewise(combined[d], x, side) - evaluatePiecewise(direct[d], x, side))).toBeLessThanOrEqual(1e-12 * scale + 1e-300);
          }
        }
      }
      let rscale = act.force + settleShear;
      solved.solutions.forEach((s, p) => {
        const w = Math.abs(factors[solved.parts[p]!.case] ?? 0);
        for (const r of s.reactions) rscale += w * (Math.abs(r.force) + Math.abs(r.moment) / beam.length);
      });
      combined.reactions.forEach((r, i) => {
        expect(Math.abs(r.force - direct.reactions[i]!.force)).toBeLessThanOrEqual(1e-12 * rscale + 1e-300);
        expect(Math.abs(r.moment - direct.reactions[i]!.moment) / beam.length).toBeLessThanOrEqual(1e-12 * rscale + 1e-300);
      });
    },
  );
});
