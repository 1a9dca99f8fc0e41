/** How a support restrains the member, for drawing. */
export type DrawnSupportType = "pin" | "roller" | "fixed" | "guided" | "spring";

/** A support to draw. */
export interface DrawnSupport {
  /** Distance from the left end, in the drawing's length unit. */
  readonly at: number;
  /** The kind of restraint. */
  readonly type: DrawnSupportType;
}

/** A load to draw, tagged by `kind`. Values follow the input convention: forces positive downward, couples positive counterclockwise. */
export type DrawnLoad =
  | {
      /** A concentrated force. */
      readonly kind: "point";
      /** Where it acts, from the left end. */
      readonly at: number;
      /** Its size, in the force unit; positive downward. */
      readonly value: number;
    }
  | {
      /** An applied couple. */
      readonly kind: "moment";
      /** Where it acts, from the left end. */
      readonly at: number;
      /** Its size, in the moment unit; positive counterclockwise. */
      readonly value: number;
    }
  | {
      /** A distributed load varying linearly from `start` to `end`. */
      readonly kind: "distributed";
      /** Where it begins, from the left end. */
      readonly from: number;
      /** Where it ends, from the left end. */
      readonly to: number;
      /** Intensity at `from`, force per length; positive downward. */
      readonly start: number;
      /** Intensity at `to`, force per length; positive downward. */
      readonly end: number;
    };

/** Everything the member drawing shows, in one consistent set of units named here. */
export interface MemberDrawing {
  /** Heading drawn above the member. */
  readonly title: string;
  /** Member length, in `lengthUnit`. */
  readonly length: number;
  /** Name of the length unit, such as `"m"`. */
  readonly lengthUnit: string;
  /** Name of the force unit, such as `"kN"`. */
  readonly forceUnit: string;
  /** Name of the moment unit, such as `"kN*m"`. */
  readonly momentUnit: string;
  /** Name of the distributed-load unit, such as `"kN/m"`. */
  readonly distributedUnit: string;
  /** Supports, anywhere along the member. */
  readonly supports: readonly DrawnSupport[];
  /** Positions of internal hinges, from the left end. */
  readonly hinges: readonly number[];
  /** Loads on the member. */
  readonly loads: readonly DrawnLoad[];
}
