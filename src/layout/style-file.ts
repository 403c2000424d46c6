// Finds and reads sheet styles: a name from styles/ or a path to a JSON or YAML file, validated by the schema.
// Errors name the file and the field, and list the styles that exist.

import { existsSync, readdirSync, readFileSync } from "node:fs";
import { extname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { parse as parseYaml } from "yaml";
import { DomeprintError } from "../errors.js";
import { styleSchema, type Style } from "./style.js";

/** styles/ sits two levels above this file both in src/layout and in dist/layout. */
export const STYLE_DIR = fileURLToPath(new URL("../../styles/", import.meta.url));

const EXTENSIONS = [".json", ".yaml", ".yml"];

export const DEFAULT_STYLE = "plant-room";

export function styleNames(): string[] {
  if (!existsSync(STYLE_DIR)) return [];
  return readdirSync(STYLE_DIR)
    .filter((file) => EXTENSIONS.includes(extname(file)))
    .map((file) => file.slice(0, -extname(file).length))
    .sort();
}

function styleError(input: string, message: string): DomeprintError {
  return new DomeprintError("E_INPUT", `style = ${JSON.stringify(input)}: ${message}; allowed: ${styleNames().join(", ")} or a path to a style file (.json, .yaml)`, {
    input: "style",
    value: input,
    allowed: styleNames().join(", "),
  });
}

/** Validates parsed style data; `source` names the file in the error. */
export function parseStyle(data: unknown, source: string): Style {
  const result = styleSchema.safeParse(data);
  if (result.success) return result.data;
  const issue = result.error.issues[0]!;
  const field = issue.path.join(".") || "(root)";
  throw new DomeprintError("E_INPUT", `style file ${source}: ${field}: ${issue.message}`, { input: `style.${field}`, value: source, allowed: issue.message });
}

function readStyleFile(path: string, input: string): Style {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch {
    throw styleError(input, "cannot read the file");
  }
  let data: unknown;
  try {
    data = extname(path) === ".json" ? JSON.parse(text) : parseYaml(text);
  } catch (e) {
    throw styleError(input, `not valid ${extname(path) === ".json" ? "JSON" : "YAML"} (${e instanceof Error ? e.message : String(e)})`);
  }
  return parseStyle(data, path);
}

function bundledPath(name: string): string | undefined {
  for (const ext of EXTENSIONS) {
    const path = join(STYLE_DIR, name + ext);
    if (existsSync(path)) return path;
  }
  return undefined;
}

/** A bundled style by name, or a style file by path (anything with a slash or a file extension). */
export function loadStyle(nameOrPath: string = DEFAULT_STYLE): Style {
  const looksLikePath = /[\\/]/.test(nameOrPath) || EXTENSIONS.includes(extname(nameOrPath));
  if (looksLikePath) return readStyleFile(nameOrPath, nameOrPath);
  const path = bundledPath(nameOrPath.toLowerCase());
  if (!path) throw styleError(nameOrPath, "no such style");
  return readStyleFile(path, nameOrPath);
}
