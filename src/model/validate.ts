// Structural validation of a model file by walking the published JSON Schema itself (the subset of
// draft 2020-12 that modelSchema uses), so that the schema and our validator cannot drift apart.
import { describeValue, issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { closestName } from "./closest.js";
import { modelSchema } from "./schema.js";
import type { SchemaNode } from "./schema-parts.js";

type Node = { readonly [keyword: string]: unknown };
type Json = Readonly<Record<string, unknown>>;

const defs = modelSchema["$defs"] as Readonly<Record<string, SchemaNode>>;

function resolve(node: Node): Node | undefined {
  const target = node["$ref"];
  if (typeof target !== "string") return undefined;
  const found = defs[target.replace("#/$defs/", "")];
  return typeof found === "object" ? found : undefined;
}

function typeOf(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return "array";
  return typeof value;
}

function typeMatches(value: unknown, type: unknown): boolean {
  const types = Array.isArray(type) ? (type as unknown[]) : [type];
  return types.some((t) => (t === "number" ? typeof value === "number" : typeOf(value) === t));
}

function titleOf(node: Node): string | undefined {
  if (typeof node["title"] === "string") return node["title"];
  const target = resolve(node);
  return target === undefined ? undefined : titleOf(target);
}

const TYPE_WORDS: Readonly<Record<string, string>> = { string: "a string", number: "a number", object: "an object", array: "a list", boolean: "true or false" };

function expected(node: Node): string {
  const title = titleOf(node);
  if (title !== undefined) return title;
  const types = Array.isArray(node["type"]) ? (node["type"] as string[]) : [String(node["type"])];
  return types.map((t) => TYPE_WORDS[t] ?? t).join(" or ");
}

const last = (path: IssuePath): string => String(path[path.length - 1] ?? "");

function context(parent: Json | undefined): string {
  if (parent === undefined) return "";
  const tag = typeof parent["type"] === "string" ? parent["type"] : typeof parent["shape"] === "string" ? parent["shape"] : undefined;
  return tag === undefined ? "" : ` for type "${tag}"`;
}

function isValid(node: SchemaNode, value: unknown): boolean {
  const out: FlexuraIssue[] = [];
  walk(node, value, [], out, undefined);
  return out.length === 0;
}

function checkObject(node: Node, value: Json, path: IssuePath, out: FlexuraIssue[]): void {
  const required = (node["required"] as readonly string[] | undefined) ?? [];
  const properties = (node["properties"] as Readonly<Record<string, SchemaNode>> | undefined) ?? {};
  const what = titleOf(node);
  for (const name of required) {
    if (!(name in value) || value[name] === undefined) {
      out.push(issue("missing-field", [...path, name], `Missing "${name}"${what === undefined ? "" : `: ${what} needs it`}.`, { field: name }));
    }
  }
  for (const [name, sub] of Object.entries(properties)) {
    if (name in value && value[name] !== undefined) walk(sub, value[name], [...path, name], out, value);
  }
  // The schema uses additionalProperties only as `false` (closed objects, so typos are caught).
  if (node["additionalProperties"] !== false) return;
  for (const name of Object.keys(value)) {
    if (name in properties || value[name] === undefined) continue;
    const near = closestName(name, Object.keys(properties));
    const hint = near === undefined ? "" : ` Did you mean "${near}"?`;
    out.push(issue("unknown-field", [...path, name], `Unknown field "${name}"${what === undefined ? "" : ` in ${what}`}.${hint}`, { field: name }));
  }
}

function checkCombinators(node: Node, value: unknown, path: IssuePath, out: FlexuraIssue[], parent: Json | undefined): void {
  for (const sub of (node["allOf"] as readonly SchemaNode[] | undefined) ?? []) walk(sub, value, path, out, parent);
  const anyOf = node["anyOf"] as readonly Node[] | undefined;
  if (anyOf !== undefined && !anyOf.some((sub) => isValid(sub, value))) {
    const names = anyOf.flatMap((sub) => (sub["required"] as readonly string[] | undefined) ?? []);
    out.push(issue("missing-field", path, `Give ${names.map((n) => `"${n}"`).join(" or ")} (or both)${context(value as Json)}.`, { fields: names }));
  }
  if (node["if"] !== undefined) {
    const branch = isValid(node["if"] as SchemaNode, value) ? node["then"] : node["else"];
    if (branch !== undefined) walk(branch as SchemaNode, value, path, out, parent);
  }
}

/** Checks `value` against one schema node, appending an issue for each problem found. */
function walk(schema: SchemaNode, value: unknown, path: IssuePath, out: FlexuraIssue[], parent: Json | undefined): void {
  if (schema === true) return;
  if (schema === false) {
    out.push(issue("field-not-allowed", path, `The field "${last(path)}" does not apply${context(parent)}; remove it.`, { field: last(path) }));
    return;
  }
  const node = schema;
  const target = resolve(node);
  if (target !== undefined) walk(target, value, path, out, parent);
  if (node["type"] !== undefined && !typeMatches(value, node["type"])) {
    out.push(issue("wrong-type", path, `Expected ${expected(node)}; got ${describeValue(value)}.`, { expected: node["type"], value: describeValue(value) }));
    return;
  }
  if (node["type"] !== undefined && typeof value === "number" && !Number.isFinite(value)) {
    out.push(issue("not-finite", path, `Expected a finite number; got ${String(value)}.`, { value: String(value) }));
  }
  if ("const" in node && value !== node["const"]) {
    out.push(issue("not-an-option", path, `Expected ${JSON.stringify(node["const"])}; got ${describeValue(value)}.`, { value: describeValue(value) }));
  }
  const options = node["enum"] as readonly unknown[] | undefined;
  if (options !== undefined && !options.includes(value)) {
    out.push(
      issue("not-an-option", path, `Expected one of ${options.map((o) => JSON.stringify(o)).join(", ")}; got ${describeValue(value)}.`, {
        value: describeValue(value),
        options,
      }),
    );
  }
  const minLength = node["minLength"];
  if (typeof minLength === "number" && typeof value === "string" && [...value].length < minLength) {
    out.push(issue("empty-string", path, `"${last(path)}" must not be empty.`));
  }
  if (Array.isArray(value)) {
    const minItems = node["minItems"];
    if (typeof minItems === "number" && value.length < minItems) {
      out.push(issue("too-few-items", path, `Give at least ${minItems} item${minItems === 1 ? "" : "s"} in "${last(path)}".`, { minItems }));
    }
    const items = node["items"] as SchemaNode | undefined;
    if (items !== undefined) value.forEach((item, i) => walk(items, item, [...path, i], out, undefined));
  }
  if (typeOf(value) === "object") checkObject(node, value as Json, path, out);
  checkCombinators(node, value, path, out, parent);
}

/**
 * Checks the structure of a model file (fields, types, allowed values) against the published
 * schema, returning every problem found (an empty list when the structure is sound).
 */
export function structuralIssues(json: unknown): readonly FlexuraIssue[] {
  const out: FlexuraIssue[] = [];
  walk(modelSchema, json, [], out, undefined);
  return out.map((i) =>
    i.code === "not-an-option" && i.path.length === 1 && i.path[0] === "format"
      ? { ...i, code: "unsupported-format", message: `This release reads model format 1; got ${String(i["value"])}. Update flexura or set "format": 1.` }
      : i,
  );
}
