/**
 * A label placer for drawings: every label gets a box computed from its text, and is put at the
 * first of its candidate positions whose box overlaps no label already placed, no obstacle (an
 * arrow, a support symbol, a curve's bounding strip) and stays inside the drawing. A label that
 * fits nowhere is returned as unplaced, for the caller to list beside the drawing: the placer never
 * lets two labels, or a label and an obstacle, overlap.
 *
 * Text boxes are exact for the monospace font the calculation sheet draws with
 * ({@link LABEL_FONT}): every character advances {@link CHARACTER_ADVANCE} of the font size.
 */

/** The font family labels are drawn with; monospace so that a text's width is known exactly. */
export const LABEL_FONT = "DejaVu Sans Mono, Liberation Mono, Menlo, Consolas, monospace";

/** The advance of one character of {@link LABEL_FONT}, as a fraction of the font size (DejaVu Sans Mono: 1233/2048). */
export const CHARACTER_ADVANCE = 0.6021;

/** An axis-aligned box in SVG user units (x right, y down): the top-left corner and the size. */
export interface LabelBox {
  /** Left edge. */
  readonly x: number;
  /** Top edge. */
  readonly y: number;
  /** Width (>= 0). */
  readonly width: number;
  /** Height (>= 0). */
  readonly height: number;
}

/** Where a label's text is anchored horizontally, as SVG's `text-anchor`. */
export type LabelAnchor = "start" | "middle" | "end";

/** One position to try for a label: an offset of the text's anchor point from the label's point. */
export interface LabelCandidate {
  /** Offset to the right, SVG units. */
  readonly dx: number;
  /** Offset downward of the text's vertical middle, SVG units. */
  readonly dy: number;
  /** How the text hangs from the anchor. */
  readonly anchor: LabelAnchor;
}

/** A label to place. */
export interface LabelRequest {
  /** Caller's key for the label (returned with it). */
  readonly id: string;
  /** The text, one line. */
  readonly text: string;
  /** The point the label belongs to, SVG units. */
  readonly x: number;
  /** The point the label belongs to, SVG units. */
  readonly y: number;
  /** Font size, SVG units. */
  readonly fontSize: number;
  /** Positions to try in order; default {@link defaultCandidates} for the font size. */
  readonly candidates?: readonly LabelCandidate[];
}

/** A label with its chosen position. */
export interface PlacedLabel {
  /** The request's key. */
  readonly id: string;
  /** The text. */
  readonly text: string;
  /** x of the text anchor, SVG units. */
  readonly x: number;
  /** Baseline y of the text, SVG units. */
  readonly baseline: number;
  /** Horizontal anchor of the text. */
  readonly anchor: LabelAnchor;
  /** The text's box, as used for the overlap test. */
  readonly box: LabelBox;
  /** Font size, SVG units. */
  readonly fontSize: number;
  /** The point the label belongs to. */
  readonly point: readonly [number, number];
}

/** What {@link placeLabels} decided. */
export interface LabelPlacement {
  /** Labels placed, none overlapping another or an obstacle. */
  readonly placed: readonly PlacedLabel[];
  /** Labels that fitted nowhere, in request order, for the caller to list beside the drawing. */
  readonly unplaced: readonly LabelRequest[];
}

/**
 * The box of one line of text in {@link LABEL_FONT}: its width is the character count times the
 * advance, its height the font size's ascent plus descent (1.2 em), with a margin of `pad` round it.
 *
 * @param text - The text.
 * @param fontSize - Font size, SVG units.
 * @param x - Anchor x.
 * @param middle - y of the text's vertical middle.
 * @param anchor - Horizontal anchor.
 * @param pad - Clearance added on every side, SVG units.
 * @example
 * ```ts
 * textBox("12.5 kN", 10, 100, 50, "middle"); // { x: 78.9, y: 44, width: 42.1, height: 12 } (about)
 * ```
 */
export function textBox(text: string, fontSize: number, x: number, middle: number, anchor: LabelAnchor, pad = 1): LabelBox {
  const width = [...text].length * CHARACTER_ADVANCE * fontSize;
  const height = 1.2 * fontSize;
  const left = anchor === "start" ? x : anchor === "end" ? x - width : x - width / 2;
  return { x: left - pad, y: middle - height / 2 - pad, width: width + 2 * pad, height: height + 2 * pad };
}

/** Whether two boxes share any area (touching edges do not count). */
export function boxesOverlap(a: LabelBox, b: LabelBox): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/** Whether `inner` lies wholly inside `outer`. */
function inside(inner: LabelBox, outer: LabelBox): boolean {
  return inner.x >= outer.x && inner.y >= outer.y && inner.x + inner.width <= outer.x + outer.width && inner.y + inner.height <= outer.y + outer.height;
}

/**
 * The positions tried by default: above, below, right and left of the point at one, two and three
 * line heights, then the four diagonals.
 *
 * @param fontSize - Font size, SVG units.
 */
export function defaultCandidates(fontSize: number): readonly LabelCandidate[] {
  const out: LabelCandidate[] = [];
  const h = 1.2 * fontSize;
  for (const k of [1, 2, 3]) {
    out.push({ dx: 0, dy: -k * h, anchor: "middle" }, { dx: 0, dy: k * h, anchor: "middle" });
    out.push({ dx: 0.5 * k * h, dy: 0, anchor: "start" }, { dx: -0.5 * k * h, dy: 0, anchor: "end" });
    out.push({ dx: 0.5 * k * h, dy: -k * h, anchor: "start" }, { dx: -0.5 * k * h, dy: -k * h, anchor: "end" });
    out.push({ dx: 0.5 * k * h, dy: k * h, anchor: "start" }, { dx: -0.5 * k * h, dy: k * h, anchor: "end" });
  }
  return out;
}

/**
 * Places labels in the order given (put the most important first), each at its first candidate
 * position that is inside `bounds` and overlaps no label placed before it and no obstacle.
 * Linear in the number of candidates times the boxes already placed near them: boxes are kept in a
 * coarse grid of cells, so a drawing with thousands of labels stays fast.
 *
 * @param requests - The labels, most important first.
 * @param obstacles - Boxes no label may overlap (arrows, symbols, the curves' strips).
 * @param bounds - The drawing area every label must lie in.
 * @returns The placed labels and those that fitted nowhere.
 * @example
 * ```ts
 * const { placed } = placeLabels([{ id: "a", text: "10 kN", x: 50, y: 40, fontSize: 10 }], [], { x: 0, y: 0, width: 200, height: 100 });
 * ```
 */
export function placeLabels(requests: readonly LabelRequest[], obstacles: readonly LabelBox[], bounds: LabelBox): LabelPlacement {
  const grid = new BoxGrid(48);
  for (const o of obstacles) grid.add(o);
  const placed: PlacedLabel[] = [];
  const unplaced: LabelRequest[] = [];
  for (const r of requests) {
    let chosen: PlacedLabel | undefined;
    for (const c of r.candidates ?? defaultCandidates(r.fontSize)) {
      const x = r.x + c.dx;
      const middle = r.y + c.dy;
      const box = textBox(r.text, r.fontSize, x, middle, c.anchor);
      if (!inside(box, bounds) || grid.hits(box)) continue;
      // The baseline sits 0.35 em below the middle of the box for this font's ascent and descent.
      chosen = { id: r.id, text: r.text, x, baseline: middle + 0.35 * r.fontSize, anchor: c.anchor, box, fontSize: r.fontSize, point: [r.x, r.y] };
      break;
    }
    if (chosen === undefined) unplaced.push(r);
    else {
      placed.push(chosen);
      grid.add(chosen.box);
    }
  }
  return { placed, unplaced };
}

/** Boxes bucketed by square cells, for overlap queries that look only at nearby boxes. */
class BoxGrid {
  private readonly cells = new Map<string, LabelBox[]>();
  constructor(private readonly size: number) {}

  private keys(b: LabelBox): string[] {
    const out: string[] = [];
    const x0 = Math.floor(b.x / this.size), x1 = Math.floor((b.x + b.width) / this.size);
    const y0 = Math.floor(b.y / this.size), y1 = Math.floor((b.y + b.height) / this.size);
    for (let i = x0; i <= x1; i++) for (let j = y0; j <= y1; j++) out.push(`${i},${j}`);
    return out;
  }

  add(b: LabelBox): void {
    for (const k of this.keys(b)) {
      const list = this.cells.get(k);
      if (list === undefined) this.cells.set(k, [b]);
      else list.push(b);
    }
  }

  hits(b: LabelBox): boolean {
    for (const k of this.keys(b)) for (const o of this.cells.get(k) ?? []) if (boxesOverlap(b, o)) return true;
    return false;
  }
}
