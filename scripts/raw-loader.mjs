// Module hooks: `import text from "./x.csv?raw"` (or a stylesheet `?inline`) yields the file's text, as in Vite.
import { readFile } from "node:fs/promises";

export async function load(url, context, nextLoad) {
  const suffix = url.startsWith("file:") ? /\?(raw|inline)$/.exec(url) : null;
  if (suffix) {
    const text = await readFile(new URL(url.slice(0, -suffix[0].length)), "utf8");
    return { format: "module", source: `export default ${JSON.stringify(text)};`, shortCircuit: true };
  }
  return nextLoad(url, context);
}
