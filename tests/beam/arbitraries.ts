// fast-check generators of stable, loaded members. Positions lie on a 1/64 grid of the length so
// that supports, hinges and loads are either at the same point or clearly apart.
import { fc } from "@fast-check/vitest";
import { trySolveBeam, type BeamInput, type StiffnessSegment } from "../../src/beam/index.js";
import type { Load } from "../../src/loads/index.js";
import type { Support } from "../../src/supports/index.js";

export const GRID = 64;

const arbValue = fc.integer({ min: -400, max: 400 }).map((v) => v / 8);

export const arbLoad = (length: number): fc.Arbitrary<Load> =>
  fc.oneof(
    fc.record({ kind: fc.constant("point" as const), at: fc.integer({ min: 0, max: GRID }), value: arbValue }).map((l) => ({ ...l, at: (l.at * length) / GRID })),
    fc.record({ kind: fc.constant("couple" as const), at: fc.integer({ min: 0, max: GRID }), value: arbValue }).map((l) => ({ ...l, at: (l.at * length) / GRID })),
    fc
      .record({ a: fc.integer({ min: 0, max: GRID }), b: fc.integer({ min: 0, max: GRID }), start: arbValue, end: arbValue })
      .filter(({ a, b }) => a !== b)
      .map(({ a, b, start, end }) => ({
        kind: "distributed" as const,
        from: (Math.min(a, b) * length) / GRID,
        to: (Math.max(a, b) * length) / GRID,
        start,
        end,
      })),
  );

const arbSupportKind = fc.constantFrom("pin", "roller", "fixed", "guided", "spring", "spring-rotational", "spring-both");

/** A support of the given kind; spring stiffness `k` (F/L) and `kr` (F L/rad). */
function makeSupport(kind: string, at: number, k: number, kr: number, settlement: number, rotation: number, useSettlement: boolean): Support {
  const s = useSettlement ? settlement : 0;
  const r = useSettlement ? rotation : 0;
  const base = (extra: Partial<Support>): Support => ({ at, ...extra }) as Support;
  switch (kind) {
    case "pin":
    case "roller":
      return base({ kind, ...(s !== 0 ? { settlement: s } : {}) });
    case "fixed":
      return base({ kind, ...(s !== 0 ? { settlement: s } : {}), ...(r !== 0 ? { rotation: r } : {}) });
    case "guided":
      return base({ kind, ...(r !== 0 ? { rotation: r } : {}) });
    case "spring":
      return base({ kind: "spring", stiffness: k, ...(s !== 0 ? { settlement: s } : {}) });
    case "spring-rotational":
      return base({ kind: "spring", rotationalStiffness: kr, ...(r !== 0 ? { rotation: r } : {}) });
    default:
      return base({ kind: "spring", stiffness: k, rotationalStiffness: kr });
  }
}

export interface MemberOptions {
  /** Allow settlements and prescribed rotations (not for superposition or reciprocity). */
  readonly settlements?: boolean;
  readonly hinges?: boolean;
  readonly maxLoads?: number;
}

/** A stable member (checked by solving), with random supports, hinges, stepped E I and loads. */
export const arbMember = (opts: MemberOptions = {}): fc.Arbitrary<BeamInput> =>
  fc
    .record({
      length: fc.integer({ min: 8, max: 160 }).map((v) => v / 8),
      ei: fc.integer({ min: 1, max: 100 }).map((v) => v * 1000),
      steps: fc.uniqueArray(fc.integer({ min: 1, max: GRID - 1 }), { maxLength: 2 }),
      stepEi: fc.array(fc.integer({ min: 1, max: 100 }).map((v) => v * 1000), { minLength: 3, maxLength: 3 }),
      anchor: fc.record({ kind: fc.constantFrom("pin", "fixed", "guided"), at: fc.integer({ min: 0, max: GRID }) }),
      others: fc.uniqueArray(fc.record({ kind: arbSupportKind, at: fc.integer({ min: 0, max: GRID }) }), { maxLength: 3, selector: (s) => s.at }),
      // spring stiffness relative to the member's (E I / L^3 and E I / L): 0.1 to 100
      k: fc.integer({ min: 1, max: 1000 }).map((v) => v / 10),
      settlement: fc.integer({ min: -20, max: 20 }).map((v) => v / 1000),
      rotation: fc.integer({ min: -20, max: 20 }).map((v) => v / 1000),
      hinges: opts.hinges === false ? fc.constant([] as number[]) : fc.uniqueArray(fc.integer({ min: 1, max: GRID - 1 }), { maxLength: 2 }),
      loads: fc.array(fc.integer({ min: 0, max: 1_000_000 }), { maxLength: opts.maxLoads ?? 6 }),
      seed: fc.integer(),
    })
    .chain((r) =>
      fc.array(arbLoad(r.length), { minLength: r.loads.length, maxLength: r.loads.length }).map((loads) => {
        const L = r.length;
        const pos = (g: number) => (g * L) / GRID;
        const k = (r.k * r.ei) / L ** 3;
        const kr = (r.k * r.ei) / L;
        const supports: Support[] = [makeSupport(r.anchor.kind, pos(r.anchor.at), k, kr, r.settlement, r.rotation, opts.settlements === true)];
        for (const o of r.others)
          if (o.at !== r.anchor.at) supports.push(makeSupport(o.kind, pos(o.at), k, kr, -r.settlement / 2, -r.rotation, opts.settlements === true));
        const cuts = [...r.steps].sort((a, b) => a - b);
        const stiffness: number | StiffnessSegment[] =
          cuts.length === 0
            ? r.ei
            : [0, ...cuts].map((c, i) => ({ from: pos(c), to: i < cuts.length ? pos(cuts[i]!) : L, stiffness: r.stepEi[i]! }));
        const member: BeamInput = { length: L, stiffness, supports, hinges: r.hinges.map(pos), loads };
        return member;
      }),
    )
    .filter((m) => {
      // members the solver warns about (badly conditioned) are checked elsewhere
      const r = trySolveBeam(m);
      return r.ok && r.value.warnings.length === 0;
    });

/** E I at x (right-hand value at a step). */
export function stiffnessAt(beam: BeamInput, x: number): number {
  if (typeof beam.stiffness === "number") return beam.stiffness;
  for (const s of beam.stiffness) if (x >= s.from && x < s.to) return s.stiffness;
  return beam.stiffness[beam.stiffness.length - 1]!.stiffness;
}

/** The downward distributed intensity at x, summed over the loads (independently of the solver). */
export function intensityAt(beam: BeamInput, x: number): number {
  let w = 0;
  for (const l of beam.loads ?? [])
    if (l.kind === "distributed" && x > l.from && x < l.to) w += l.start + ((l.end - l.start) * (x - l.from)) / (l.to - l.from);
  return w;
}

/** Sample points that never fall on the 1/64 grid, so no jump sits exactly on one. */
export function samplePoints(length: number, count = 23): number[] {
  return Array.from({ length: count }, (_, k) => (length * (k + 0.37)) / count);
}

/** The size of the loading, to scale tolerances: total absolute force and moment about 0. */
export function loadScale(beam: BeamInput): { force: number; moment: number } {
  let force = 0;
  let moment = 0;
  for (const l of beam.loads ?? []) {
    switch (l.kind) {
      case "point":
        force += Math.abs(l.value);
        moment += Math.abs(l.value) * beam.length;
        break;
      case "couple":
        moment += Math.abs(l.value);
        break;
      case "distributed":
        force += (Math.abs(l.start) + Math.abs(l.end)) * (l.to - l.from);
        moment += (Math.abs(l.start) + Math.abs(l.end)) * (l.to - l.from) * beam.length;
        break;
    }
  }
  return { force: force + 1e-300, moment: moment + force * beam.length + 1e-300 };
}

/** Largest E I along the member. */
export function maxStiffness(beam: BeamInput): number {
  return typeof beam.stiffness === "number" ? beam.stiffness : Math.max(...beam.stiffness.map((s) => s.stiffness));
}

/**
 * Scales for rounding tolerances: the forces and moments the loads and the prescribed
 * displacements put into the member (internal forces of that size cancel in the results).
 */
export function actionScale(beam: BeamInput, reactions: readonly { force: number; moment: number }[]): { force: number; moment: number } {
  const loads = loadScale(beam);
  const L = beam.length;
  let imposed = 0;
  for (const s of beam.supports) {
    imposed += Math.abs(s.settlement ?? 0) / (L * L) + Math.abs(s.rotation ?? 0) / L;
    if (s.stiffness !== undefined) imposed += (s.stiffness * Math.abs(s.settlement ?? 0)) / maxStiffness(beam);
  }
  const fromDisplacements = maxStiffness(beam) * imposed;
  const r = reactions.reduce((acc, q) => acc + Math.abs(q.force) + Math.abs(q.moment) / L, 0);
  const force = loads.force + loads.moment / L + r + fromDisplacements;
  return { force, moment: force * L };
}

/** The size of the prescribed settlements and rotations, as a deflection (length units). */
export function displacementScale(beam: BeamInput): number {
  return beam.supports.reduce((acc, s) => acc + Math.abs(s.settlement ?? 0) + Math.abs(s.rotation ?? 0) * beam.length, 0);
}
