// The one place the bundled data files enter the code in Node (the CLI, the benchmarks, the node
// tests): read from data/ beside src/. The browser takes ./browser.ts instead (package.json
// "imports": "#data-files" with the condition "node").
import { readFileSync } from "node:fs";
import type { DataFileName } from "./names";

const texts = new Map<DataFileName, string>();

/** The text of a bundled data file (read once). */
export function dataFileText(name: DataFileName): string {
  let text = texts.get(name);
  if (text === undefined) {
    text = readFileSync(new URL(`../../data/${name}`, import.meta.url), "utf8");
    texts.set(name, text);
  }
  return text;
}
