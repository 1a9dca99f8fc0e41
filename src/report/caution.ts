/**
 * The caution printed with every report: what kind of analysis flexura performs and who answers
 * for its use.
 *
 * @example
 * ```ts
 * console.log(REPORT_CAUTION);
 * ```
 */
export const REPORT_CAUTION =
  "Caution: flexura performs an elastic, first-order (small-deflection, Euler-Bernoulli) analysis. " +
  "You are responsible for the loads, for compliance with the codes that apply to your work, and for " +
  "review of the results by a licensed engineer. Local codes govern.";

/**
 * Wraps text to lines of at most `width` characters, breaking at spaces (a word longer than the
 * width stands alone on its line). Each line is prefixed with `indent`.
 *
 * @example
 * ```ts
 * wrapText("one two three", 8); // "one two\nthree"
 * ```
 */
export function wrapText(text: string, width: number, indent = ""): string {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter((w) => w !== "")) {
    if (line === "") line = word;
    else if (line.length + 1 + word.length <= width) line += ` ${word}`;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line !== "") lines.push(line);
  return lines.map((l) => indent + l).join("\n");
}
