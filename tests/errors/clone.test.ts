import { describe, expect, it } from "vitest";
import { FlexuraError, isFlexuraError, issue, reviveFlexuraError } from "../../src/errors/index.js";

// structuredClone keeps an Error's message, stack and cause, nothing else (HTML Living Standard,
// "Safe passing of structured data", the serialisation steps for Error objects).
const error = (): FlexuraError =>
  new FlexuraError([issue("load-outside-member", ["loads", 2, "at"], "The load is outside the member.", { at: 7.5, length: 6 }), issue("not-finite", ["E"], "E must be finite.")]);

describe("a cloned FlexuraError keeps its issues", () => {
  it("structuredClone carries every issue, with its code, path and details", () => {
    const copy = structuredClone(error());
    expect(copy.message).toBe(error().message);
    expect((copy as { cause?: { flexuraIssues?: unknown } }).cause?.flexuraIssues).toEqual(error().issues);
  });

  it("reviveFlexuraError makes the clone a FlexuraError again", () => {
    const revived = reviveFlexuraError(structuredClone(error()));
    expect(revived).toBeDefined();
    expect(isFlexuraError(revived)).toBe(true);
    expect(revived?.code).toBe("load-outside-member");
    expect(revived?.issues).toEqual(error().issues);
    expect(revived?.message).toBe(error().message);
  });

  it("a FlexuraError sent through a MessageChannel arrives with its issues", async () => {
    const { port1, port2 } = new MessageChannel();
    const received = new Promise<unknown>((resolve) => {
      port2.onmessage = (event: MessageEvent) => resolve(event.data);
    });
    port1.postMessage(error());
    const copy = await received;
    port1.close();
    port2.close();
    expect(reviveFlexuraError(copy)?.issues).toEqual(error().issues);
  });

  it("reviveFlexuraError returns a FlexuraError as it is, and undefined for anything else", () => {
    const e = error();
    expect(reviveFlexuraError(e)).toBe(e);
    expect(reviveFlexuraError(new Error("x"))).toBeUndefined();
    expect(reviveFlexuraError(null)).toBeUndefined();
    expect(reviveFlexuraError("text")).toBeUndefined();
    expect(reviveFlexuraError(new Error("x", { cause: "y" }))).toBeUndefined();
    expect(reviveFlexuraError(new Error("x", { cause: { flexuraIssues: [] } }))).toBeUndefined();
    expect(reviveFlexuraError(new Error("x", { cause: { flexuraIssues: [{ code: 1, path: [], message: "m" }] } }))).toBeUndefined();
    expect(reviveFlexuraError(new Error("x", { cause: { flexuraIssues: [{ code: "c", path: [{}], message: "m" }] } }))).toBeUndefined();
    expect(reviveFlexuraError(new Error("x", { cause: { flexuraIssues: [null] } }))).toBeUndefined();
  });

  it("the issues in cause are the error's own, frozen", () => {
    const e = error();
    expect((e.cause as { flexuraIssues: unknown }).flexuraIssues).toBe(e.issues);
    expect(Object.isFrozen(e.cause)).toBe(true);
  });
});
