import { isFlexuraError } from "../../src/errors/index.js";

/** The `code@path` of every issue `fn` throws; fails the test if it throws something else or nothing. */
export function issueCodes(fn: () => unknown): string[] {
  try {
    fn();
  } catch (e) {
    if (isFlexuraError(e)) return e.issues.map((i) => `${i.code}@${i.path.join(".")}`);
    throw e;
  }
  throw new Error("did not throw");
}
