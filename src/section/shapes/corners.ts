import type { Material, SectionPart } from "../types.js";
import { withExtras } from "./dimensions.js";

/**
 * Four fillets filling the corners of the rectangle |z| <= halfWidth, |y| <= halfDepth from the
 * inside (as holes they round off the rectangle's corners).
 */
export function cornerFillets(halfWidth: number, halfDepth: number, r: number, material: Material | undefined, hole: boolean): SectionPart[] {
  if (!(r > 0)) return [];
  const w = halfWidth;
  const h = halfDepth;
  return [
    withExtras({ kind: "fillet", corner: { y: h, z: w }, radius: r, orientation: Math.PI }, material, hole),
    withExtras({ kind: "fillet", corner: { y: h, z: -w }, radius: r, orientation: -Math.PI / 2 }, material, hole),
    withExtras({ kind: "fillet", corner: { y: -h, z: -w }, radius: r, orientation: 0 }, material, hole),
    withExtras({ kind: "fillet", corner: { y: -h, z: w }, radius: r, orientation: Math.PI / 2 }, material, hole),
  ];
}
