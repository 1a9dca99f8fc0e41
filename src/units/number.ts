const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;

/** The number at the start of `text` (after leading whitespace), or undefined if none. */
export function readLeadingNumber(text: string): { readonly digits: string; readonly rest: string } | undefined {
  const trimmed = text.trimStart();
  const m = NUMBER.exec(trimmed);
  if (m === null) return undefined;
  return { digits: m[0], rest: trimmed.slice(m[0].length) };
}
