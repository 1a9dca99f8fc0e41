export type { FlexuraIssue, IssuePath } from "./issue.js";
export { formatPath } from "./issue.js";
export { FlexuraError, isFlexuraError, reviveFlexuraError, issue, fail } from "./error.js";
export type { Result } from "./result.js";
export { attempt } from "./result.js";
export { IssueCollector } from "./collector.js";
export { requireFinite, describeValue } from "./finite.js";
export { closestName, unknownKeyHint } from "./closest.js";
