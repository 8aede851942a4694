/**
 * YAML text → plain value. The error type for bad input (input-error.ts) is exported here too.
 */
import { isAlias, isMap, isScalar, isSeq, parseDocument, type Document, type Node } from "yaml";
import { InputError } from "./input-error.js";

export { InputError };

/** Largest scenario file accepted, bytes. */
export const MAX_FILE_BYTES = 1_000_000;

/**
 * Most values (scalars, mappings, lists) a file may stand for once its aliases are expanded. Aliases are
 * limited by what they expand to, not by how many there are: 101 splices sharing one `&anchor` are fine,
 * an alias bomb is not. A file of MAX_FILE_BYTES holds well under this many values without aliases.
 */
export const MAX_EXPANDED_VALUES = 1_000_000;

/** The tags of the YAML 1.2 core schema, the only ones a file may spell out (`!!str 8.8`). */
const CORE_TAGS = new Set(["str", "int", "float", "bool", "null", "map", "seq"].map((t) => `tag:yaml.org,2002:${t}`));

type Path = Array<string | number>;

/** A field path as the error messages print it: `plates.main.width`, `layout.holes[0][1]`. */
export function pathText(path: ReadonlyArray<PropertyKey>): string {
  return path.reduce<string>((s, p) => (typeof p === "number" ? `${s}[${p}]` : s ? `${s}.${String(p)}` : String(p)), "");
}

/** Every node of the document with its field path, aliases not followed (each node once). */
function* nodesOf(node: unknown, path: Path): Generator<{ node: Node; path: Path }> {
  if (isScalar(node)) yield { node, path };
  else if (isMap(node)) {
    yield { node, path };
    for (const pair of node.items) {
      const key = isScalar(pair.key) ? String(pair.key.value) : "?";
      if (isScalar(pair.key) || isMap(pair.key) || isSeq(pair.key)) yield* nodesOf(pair.key, path);
      yield* nodesOf(pair.value, [...path, key]);
    }
  } else if (isSeq(node)) {
    yield { node, path };
    let i = 0;
    for (const item of node.items) yield* nodesOf(item, [...path, i++]);
  }
}

/** Refuse a tag outside the core schema: `!in 0.5` would otherwise be read silently as the text "0.5". */
function refuseUnknownTags(doc: Document): void {
  for (const { node, path } of nodesOf(doc.contents, [])) {
    const tag = (node as { tag?: string }).tag;
    if (tag !== undefined && !CORE_TAGS.has(tag)) {
      throw new InputError(pathText(path), `unknown YAML tag "${tag}": tags are not part of the format (write a unit in the value instead, e.g. "0.5 in")`);
    }
  }
}

/** The number of values the document stands for with every alias expanded (each anchor counted once, then reused). */
function expandedSize(doc: Document): number {
  const sizes = new Map<unknown, number>();
  const open = new Set<unknown>();
  const size = (node: unknown): number => {
    if (isAlias(node)) {
      const target = node.resolve(doc);
      if (target === undefined) return 1;
      if (open.has(target)) throw new InputError("", "a YAML alias refers to a value that contains it");
      return size(target);
    }
    const known = sizes.get(node);
    if (known !== undefined) return known;
    open.add(node);
    let n = 1;
    if (isMap(node)) for (const pair of node.items) n += size(pair.key) + size(pair.value);
    else if (isSeq(node)) for (const item of node.items) n += size(item);
    open.delete(node);
    n = Math.min(n, Number.MAX_SAFE_INTEGER);
    sizes.set(node, n);
    return n;
  };
  return size(doc.contents);
}

/** The first number that is not finite (.nan, .inf), with its path. */
function nonFinite(value: unknown, path: Path): { path: Path; value: number } | null {
  if (typeof value === "number") return Number.isFinite(value) ? null : { path, value };
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = nonFinite(value[i], [...path, i]);
      if (found) return found;
    }
  } else if (value !== null && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      const found = nonFinite(v, [...path, k]);
      if (found) return found;
    }
  }
  return null;
}

/** Line and column of a character offset (1-based). */
function lineColumn(text: string, offset: number): string {
  const before = text.slice(0, offset).split("\n");
  return `line ${before.length}, column ${(before[before.length - 1]?.length ?? 0) + 1}`;
}

/**
 * Parse YAML text into a plain value, rejecting NUL bytes, syntax errors, duplicate keys, unknown tags,
 * aliases that expand beyond MAX_EXPANDED_VALUES, and numbers that are not finite (.nan, .inf).
 * Aliased values are shared (not copied) in the result.
 */
export function parseYaml(text: string): unknown {
  if (text.length > MAX_FILE_BYTES) throw new InputError("", `file is larger than ${MAX_FILE_BYTES} bytes`);
  const nul = text.indexOf("\u0000");
  if (nul >= 0) throw new InputError(lineColumn(text, nul), "the file holds a NUL byte (a binary file, or UTF-16 text without a byte-order mark?): save it as UTF-8 text");
  const doc = parseDocument(text, { uniqueKeys: true, prettyErrors: true, strict: true });
  const err = doc.errors[0];
  if (err) {
    const line = err.linePos?.[0];
    const where = line ? `line ${line.line}, column ${line.col}` : "YAML";
    const reason = err.message.split("\n")[0]!.replace(/ at line \d+, column \d+:?$/, "");
    throw new InputError(where, `YAML syntax error: ${reason}`);
  }
  refuseUnknownTags(doc);
  const values = expandedSize(doc);
  if (values > MAX_EXPANDED_VALUES) throw new InputError("", `YAML aliases expand the file to ${values > 1e15 ? "more than 10^15" : values} values, more than the ${MAX_EXPANDED_VALUES} accepted`);
  let value: unknown;
  try {
    value = doc.toJS({ maxAliasCount: -1 });
  } catch (e) {
    throw new InputError("", `YAML could not be read: ${e instanceof Error ? e.message.split("\n")[0] : String(e)}`);
  }
  const bad = nonFinite(value, []);
  if (bad) throw new InputError(pathText(bad.path), `${Number.isNaN(bad.value) ? ".nan" : bad.value > 0 ? ".inf" : "-.inf"} is not a finite number (NaN and infinity are not accepted)`);
  return value;
}
