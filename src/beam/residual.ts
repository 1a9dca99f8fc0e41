import type { Load } from "../loads/index.js";
import type { BeamResidual, Reaction } from "./types.js";

// Error-free transformations (Knuth's two-sum, Dekker's two-product; see Ogita, Rump & Oishi,
// "Accurate sum and dot product", SIAM J. Sci. Comput. 26 (2005)): the residual is summed in
// double-double, so the only rounding left is that of each load's own resultant and the final one.

const SPLIT = 134217729; // 2^27 + 1

/** A running double-double sum. */
class Sum {
  hi = 0;
  lo = 0;
  add(a: number): void {
    const s = this.hi + a;
    const b = s - this.hi;
    this.lo += this.hi - (s - b) + (a - b);
    this.hi = s;
  }
  /** Adds a * b exactly. */
  addProduct(a: number, b: number): void {
    const p = a * b;
    const ca = SPLIT * a;
    const ah = ca - (ca - a);
    const al = a - ah;
    const cb = SPLIT * b;
    const bh = cb - (cb - b);
    const bl = b - bh;
    const e = al * bl - (((p - ah * bh) - al * bh) - ah * bl);
    this.add(p);
    this.lo += e;
  }
  get value(): number {
    return this.hi + this.lo;
  }
}

/**
 * The equilibrium residual of a solution: reactions plus loads, force (up positive) and moment
 * about x = 0 (counterclockwise positive), summed without rounding (double-double with exact
 * products), so it measures the solution's own imbalance and not the summation's.
 */
export function residualOf(loads: readonly Load[], reactions: readonly Reaction[]): BeamResidual {
  const force = new Sum();
  const moment = new Sum();
  for (const r of reactions) {
    force.add(r.force);
    moment.addProduct(r.force, r.at);
    moment.add(r.moment);
  }
  for (const l of loads) {
    switch (l.kind) {
      case "point":
        force.add(-l.value);
        moment.addProduct(-l.value, l.at);
        break;
      case "couple":
        moment.add(l.value);
        break;
      case "distributed": {
        const h = l.to - l.from;
        const total = 0.5 * (l.start + l.end) * h;
        force.add(-total);
        moment.addProduct(-total, l.from);
        // first moment of the trapezoid about its start: h^2 (start / 6 + end / 3)
        moment.add(-(h * h * (l.start / 6 + l.end / 3)));
        break;
      }
      default:
        return l satisfies never;
    }
  }
  return Object.freeze({ force: force.value + 0, moment: moment.value + 0 });
}
