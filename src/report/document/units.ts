/**
 * Units as a printed document shows them: `kN*m` as `kN·m`, `mm^4` as `mm⁴`; or left in plain
 * text (`kN*m`, `mm^4`) for output that must stay ASCII.
 */

const SUPERSCRIPT: Readonly<Record<string, string>> = { "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻" };

/**
 * A unit written for print: products with a middle dot, powers as superscripts. With `plain`
 * true the unit is returned as given.
 *
 * @param unit - A unit as the model names it, such as `"kN*m"` or `"mm^4"`.
 * @param plain - Keep the plain-text spelling.
 * @example
 * ```ts
 * printedUnit("kN*m"); // "kN·m"
 * printedUnit("mm^4"); // "mm⁴"
 * printedUnit("kN*m^2", true); // "kN*m^2"
 * ```
 */
export function printedUnit(unit: string, plain = false): string {
  if (plain) return unit;
  return unit.replace(/\*/g, "·").replace(/\^(-?\d+)/g, (_, p: string) => [...p].map((c) => SUPERSCRIPT[c] ?? c).join(""));
}
