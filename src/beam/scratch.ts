/**
 * Working storage for the solve, reused from one solve to the next so that a solve allocates
 * only what it returns. Solves are synchronous; a solve started while another is under way (from
 * a getter on the input, say) gets storage of its own, so no solve ever sees another's numbers.
 * Arrays are at least as long as asked for, often longer: index them, never read `.length`.
 */
export interface Scratch {
  /** Candidate node positions, before sorting and merging, and room to sort them. */
  raw: Float64Array;
  spare: Float64Array;
  /** Per piece: load intensity at each end. */
  wLeft: Float64Array;
  wRight: Float64Array;
  /** Per piece: E I. Per element: hinge release at the right end, the four fixed-end actions, one E I or not, flexibility. */
  ei: Float64Array;
  released: Uint8Array;
  fixedEnd: Float64Array;
  uniform: Uint8Array;
  flexibility: Float64Array;
  /** Per breakpoint: applied force and couple; structural mark (1 node, 2 hinge); structural index. */
  force: Float64Array;
  couple: Float64Array;
  mark: Uint8Array;
  jointOf: Int32Array;
  /** Per structural node: its breakpoint. */
  joint: Int32Array;
  /** Per support: its structural node. */
  supportNode: Int32Array;
  /** Stiffness system: band, right-hand side (then displacements), prescribed flags and values. */
  band: Float64Array;
  rhs: Float64Array;
  prescribed: Uint8Array;
  value: Float64Array;
  /** Per element: the four end forces, and the size of the terms each sums. */
  endForces: Float64Array;
  endSizes: Float64Array;
  /** Per structural node, for the balance check: rigid restraint flags (two per node), spring force and moment. */
  rigid: Uint8Array;
  springV: Float64Array;
  springR: Float64Array;
}

function fresh(): Scratch {
  // empty to start with: each array is replaced by a long enough one on first use
  const f = new Float64Array(0);
  const u = new Uint8Array(0);
  const i = new Int32Array(0);
  return { raw: f, spare: f, wLeft: f, wRight: f, ei: f, released: u, fixedEnd: f, uniform: u, flexibility: f, force: f, couple: f, mark: u, jointOf: i, joint: i, supportNode: i, band: f, rhs: f, prescribed: u, value: f, endForces: f, endSizes: f, rigid: u, springV: f, springR: f };
}

const shared = fresh();
let sharedInUse = false;

/** Storage for one solve: the shared one when free, else a new one. Give it back with {@link releaseScratch}. */
export function acquireScratch(): Scratch {
  if (sharedInUse) return fresh();
  sharedInUse = true;
  return shared;
}

/** Returns storage taken by {@link acquireScratch}. */
export function releaseScratch(scratch: Scratch): void {
  if (scratch === shared) sharedInUse = false;
}

/** Grows a capacity to at least `n`, with headroom so that slowly growing members do not reallocate each time. */
function capacity(current: number, n: number): number {
  return current >= n ? current : Math.max(n, 2 * current, 64);
}

/** Makes room for `count` candidate node positions. */
export function ensureRaw(s: Scratch, count: number): void {
  if (s.raw.length < count) {
    const c = capacity(s.raw.length, count);
    s.raw = new Float64Array(c);
    s.spare = new Float64Array(c);
  }
}

/**
 * Makes room for a member of `nodes` nodes and `supports` supports, and zeroes the per-breakpoint and
 * per-piece accumulators (the stiffness system is zeroed by its own solve).
 */
export function ensureNodes(s: Scratch, nodes: number, supports: number): void {
  const elements = nodes - 1;
  if (s.ei.length < elements) {
    const c = capacity(s.ei.length, elements);
    s.ei = new Float64Array(c);
    s.wLeft = new Float64Array(c);
    s.wRight = new Float64Array(c);
    s.released = new Uint8Array(c);
    s.fixedEnd = new Float64Array(4 * c);
    s.uniform = new Uint8Array(c);
    s.flexibility = new Float64Array(5 * c);
    s.endForces = new Float64Array(4 * c);
    s.endSizes = new Float64Array(4 * c);
  } else {
    for (let i = 0; i < elements; i++) s.wLeft[i] = s.wRight[i] = 0;
  }
  if (s.force.length < nodes) {
    const c = capacity(s.force.length, nodes);
    s.force = new Float64Array(c);
    s.couple = new Float64Array(c);
    s.mark = new Uint8Array(c);
    s.jointOf = new Int32Array(c);
    s.joint = new Int32Array(c);
    s.rigid = new Uint8Array(2 * c);
    s.springV = new Float64Array(c);
    s.springR = new Float64Array(c);
    s.rhs = new Float64Array(2 * c);
    s.prescribed = new Uint8Array(2 * c);
    s.value = new Float64Array(2 * c);
    s.band = new Float64Array(8 * c);
  } else {
    // plain loops: for the short arrays of a typical member they beat the built-in fill's call cost
    for (let i = 0; i < nodes; i++) {
      s.force[i] = s.couple[i] = s.springV[i] = s.springR[i] = 0;
      s.mark[i] = s.rigid[2 * i] = s.rigid[2 * i + 1] = 0;
    }
  }
  if (s.supportNode.length < supports) s.supportNode = new Int32Array(capacity(s.supportNode.length, supports));
}
