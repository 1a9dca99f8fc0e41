// Structural validation of a model file by walking the published JSON Schema itself (the subset of
// draft 2020-12 that modelSchema uses), so that the schema and our validator cannot drift apart.
import { closestName, describeValue, issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { modelSchema } from "./schema.js";
import type { SchemaNode } from "./schema-parts.js";

type Node = { readonly [keyword: string]: unknown };
type Json = Readonly<Record<string, unknown>>;

const defs = modelSchema["$defs"] as Readonly<Record<string, SchemaNode>>;

/** True when `name` is an own property of `value`: never a member inherited from Object.prototype. */
const has = (value: object, name: string): boolean => Object.hasOwn(value, name);

/**
 * Where issues go. Probing a branch (`if`, `anyOf`) only needs to know whether any issue arises,
 * so a probe stops at the first one and never builds its message.
 */
interface Sink {
  /** True once anything was reported while probing: the walk can stop. */
  failed: boolean;
  /** Records the issue built by `make` (a probe only notes that there was one). */
  add(make: () => FlexuraIssue): void;
}

function collector(out: FlexuraIssue[]): Sink {
  return {
    failed: false,
    add(make) {
      out.push(make());
    },
  };
}

function probe(): Sink {
  return {
    failed: false,
    add() {
      this.failed = true;
    },
  };
}

function resolve(node: Node): Node | undefined {
  const target = node["$ref"];
  if (typeof target !== "string") return undefined;
  const name = target.replace("#/$defs/", "");
  const found = has(defs, name) ? defs[name] : undefined;
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
  const sink = probe();
  walk(node, value, [], sink, undefined);
  return !sink.failed;
}

/** The value of an own property of `value`, or undefined (inherited members are never read). */
const ownValue = (value: Json, name: string): unknown => (has(value, name) ? value[name] : undefined);

function checkObject(node: Node, value: Json, path: IssuePath, out: Sink): void {
  const required = (node["required"] as readonly string[] | undefined) ?? [];
  const properties = (node["properties"] as Readonly<Record<string, SchemaNode>> | undefined) ?? {};
  for (const name of required) {
    if (ownValue(value, name) === undefined) {
      out.add(() => {
        const what = titleOf(node);
        return issue("missing-field", [...path, name], `Missing "${name}"${what === undefined ? "" : `: ${what} needs it`}.`, { field: name });
      });
      if (out.failed) return;
    }
  }
  for (const name of Object.keys(properties)) {
    const field = ownValue(value, name);
    if (field !== undefined) walk(properties[name] as SchemaNode, field, [...path, name], out, value);
    if (out.failed) return;
  }
  // The schema uses additionalProperties only as `false` (closed objects, so typos are caught).
  if (node["additionalProperties"] !== false) return;
  for (const name of Object.keys(value)) {
    if (has(properties, name) || value[name] === undefined) continue;
    out.add(() => {
      const what = titleOf(node);
      const near = closestName(name, Object.keys(properties));
      const hint = near === undefined ? "" : ` Did you mean "${near}"?`;
      return issue("unknown-field", [...path, name], `Unknown field "${name}"${what === undefined ? "" : ` in ${what}`}.${hint}`, { field: name });
    });
    if (out.failed) return;
  }
}

function checkCombinators(node: Node, value: unknown, path: IssuePath, out: Sink, parent: Json | undefined): void {
  for (const sub of (node["allOf"] as readonly SchemaNode[] | undefined) ?? []) {
    walk(sub, value, path, out, parent);
    if (out.failed) return;
  }
  const anyOf = node["anyOf"] as readonly Node[] | undefined;
  if (anyOf !== undefined && !anyOf.some((sub) => isValid(sub, value))) {
    out.add(() => {
      const names = anyOf.flatMap((sub) => (sub["required"] as readonly string[] | undefined) ?? []);
      return issue("missing-field", path, `Give ${names.map((n) => `"${n}"`).join(" or ")} (or both)${context(value as Json)}.`, { fields: names });
    });
    if (out.failed) return;
  }
  if (node["if"] !== undefined) {
    const branch = isValid(node["if"] as SchemaNode, value) ? node["then"] : node["else"];
    if (branch !== undefined) walk(branch as SchemaNode, value, path, out, parent);
  }
}

/** Checks `value` against one schema node, reporting an issue for each problem found. */
function walk(schema: SchemaNode, value: unknown, path: IssuePath, out: Sink, parent: Json | undefined): void {
  if (out.failed) return;
  if (schema === true) return;
  if (schema === false) {
    out.add(() => issue("field-not-allowed", path, `The field "${last(path)}" does not apply${context(parent)}; remove it.`, { field: last(path) }));
    return;
  }
  const node = schema;
  const target = resolve(node);
  if (target !== undefined) walk(target, value, path, out, parent);
  if (out.failed) return;
  if (node["type"] !== undefined && !typeMatches(value, node["type"])) {
    out.add(() => issue("wrong-type", path, `Expected ${expected(node)}; got ${describeValue(value)}.`, { expected: node["type"], value: describeValue(value) }));
    return;
  }
  if (node["type"] !== undefined && typeof value === "number" && !Number.isFinite(value)) {
    out.add(() => issue("not-finite", path, `Expected a finite number; got ${String(value)}.`, { value: String(value) }));
  }
  if (has(node, "const") && value !== node["const"]) {
    out.add(() => issue("not-an-option", path, `Expected ${JSON.stringify(node["const"])}; got ${describeValue(value)}.`, { value: describeValue(value) }));
  }
  const options = node["enum"] as readonly unknown[] | undefined;
  if (options !== undefined && !options.includes(value)) {
    out.add(() =>
      issue("not-an-option", path, `Expected one of ${options.map((o) => JSON.stringify(o)).join(", ")}; got ${describeValue(value)}.`, {
        value: describeValue(value),
        options,
      }),
    );
  }
  if (typeof value === "string") checkString(node, value, path, out);
  if (out.failed) return;
  if (Array.isArray(value)) {
    const minItems = node["minItems"];
    if (typeof minItems === "number" && value.length < minItems) {
      out.add(() => issue("too-few-items", path, `Give at least ${minItems} item${minItems === 1 ? "" : "s"} in "${last(path)}".`, { minItems }));
    }
    const maxItems = node["maxItems"];
    if (typeof maxItems === "number" && value.length > maxItems) {
      // Refused whole: reading (and reporting on) every item of a list this long is the work the limit bounds.
      out.add(() => issue("too-many-items", path, `"${last(path)}" holds ${value.length} items; a model may hold at most ${maxItems} in one list.`, { maxItems, count: value.length }));
      return;
    }
    const items = node["items"] as SchemaNode | undefined;
    if (items !== undefined) {
      for (let i = 0; i < value.length && !out.failed; i++) walk(items, value[i] as unknown, [...path, i], out, undefined);
    }
  }
  if (typeOf(value) === "object") checkObject(node, value as Json, path, out);
  if (out.failed) return;
  checkCombinators(node, value, path, out, parent);
}

/** `minLength` (counted in code points) and `pattern` (the schema uses only "\\S": not blank). */
function checkString(node: Node, value: string, path: IssuePath, out: Sink): void {
  const minLength = node["minLength"];
  if (typeof minLength === "number" && [...value].length < minLength) {
    out.add(() => issue("empty-string", path, `"${last(path)}" must not be empty.`));
    return;
  }
  const pattern = node["pattern"];
  if (typeof pattern === "string" && !new RegExp(pattern, "u").test(value)) {
    out.add(() => issue("empty-string", path, `"${last(path)}" must not be blank (only spaces or tabs); write a value or leave the field out.`, { value }));
  }
}

/**
 * Checks the structure of a model file (fields, types, allowed values) against the published
 * schema, returning every problem found (an empty list when the structure is sound).
 */
export function structuralIssues(json: unknown): readonly FlexuraIssue[] {
  const out: FlexuraIssue[] = [];
  walk(modelSchema, json, [], collector(out), undefined);
  return out.map((i) =>
    i.code === "not-an-option" && i.path.length === 1 && i.path[0] === "format"
      ? { ...i, code: "unsupported-format", message: `This release reads model format 1; got ${String(i["value"])}. Update flexura or set "format": 1.` }
      : i,
  );
}
