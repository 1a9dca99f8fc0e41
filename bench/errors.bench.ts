import { bench, suite } from "./harness.js";
import { FlexuraError, formatPath } from "../src/errors/index.js";

suite("errors", () => {
  bench("errors: formatPath of a three-part path", () => formatPath(["loads", 2, "at"]));
  bench("errors: build a FlexuraError with two issues", () =>
    new FlexuraError([
      { code: "a", path: ["x"], message: "A." },
      { code: "b", path: ["y", 1], message: "B." },
    ]),
  );
});
