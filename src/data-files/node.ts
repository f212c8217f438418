// The one place the bundled data files enter the code in Node (the CLI, the benchmarks, the node
// tests): read from data/ beside src/. The browser takes ./browser.ts instead (package.json
// "imports": "#data-files" with the condition "node").
import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import type { DataFileName } from "./names";

// A path, not a URL object: a test environment with a DOM (happy-dom) replaces the global URL.
const DATA_DIR = join(dirname(fileURLToPath(import.meta.url)), "..", "..", "data");
const texts = new Map<DataFileName, string>();

/** The text of a bundled data file (read once). */
export function dataFileText(name: DataFileName): string {
  let text = texts.get(name);
  if (text === undefined) {
    text = readFileSync(join(DATA_DIR, name), "utf8");
    texts.set(name, text);
  }
  return text;
}
