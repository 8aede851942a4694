/**
 * The scenario the workbench edits, held as a YAML document so that a file opened and saved again
 * keeps its comments and order. Every edit sets or removes one field; the text is what `check` reads.
 */
import { Document, isMap, isScalar, parseDocument } from "yaml";
import { InputError, parseYaml } from "../io/yaml.js";

export class ScenarioDocument {
  private constructor(private readonly doc: Document) {}

  /** A scenario file's text, read as the CLI reads it (syntax, duplicate keys, size), or an InputError. */
  static open(text: string): ScenarioDocument {
    const value = parseYaml(text);
    if (value !== null && value !== undefined && (typeof value !== "object" || Array.isArray(value))) {
      throw new InputError("", "the scenario must be a YAML mapping of fields (name, code, splice, plates, load, ...)");
    }
    const doc: Document = parseDocument(text, { uniqueKeys: true, prettyErrors: true, strict: true });
    if (!isMap(doc.contents)) doc.contents = doc.createNode({});
    return new ScenarioDocument(doc);
  }

  /** An empty scenario: every field blank. */
  static blank(): ScenarioDocument {
    return new ScenarioDocument(new Document({}));
  }

  /**
   * Set a field, or remove it (undefined), with sections left empty removed too. A scalar is changed
   * in place so that its comment stays; a list or table is written in flow style.
   */
  set(path: readonly string[], value: unknown): void {
    if (value === undefined) {
      if (this.doc.hasIn(path)) this.doc.deleteIn(path);
      for (let i = path.length - 1; i >= 1; i--) {
        const parent = this.doc.getIn(path.slice(0, i), true);
        if (isMap(parent) && parent.items.length === 0) this.doc.deleteIn(path.slice(0, i));
        else break;
      }
      return;
    }
    const node = this.doc.getIn(path, true);
    if (isScalar(node) && (value === null || typeof value !== "object")) {
      node.value = value;
      return;
    }
    const created = this.doc.createNode(value, { flow: true });
    if (node && typeof node === "object" && "comment" in node) created.comment = (node as { comment?: string | null }).comment ?? null;
    this.doc.setIn(path, created);
  }

  /** The scenario file's text. */
  text(): string {
    const contents = this.doc.contents;
    return isMap(contents) && contents.items.length === 0 ? "" : String(this.doc);
  }

  /** The scenario as a plain value. */
  plain(): Record<string, unknown> {
    const v = this.doc.toJS({ maxAliasCount: 100 }) as unknown;
    return v !== null && typeof v === "object" && !Array.isArray(v) ? (v as Record<string, unknown>) : {};
  }
}
