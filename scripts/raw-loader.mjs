// Module hooks: `import text from "./x.csv?raw"` yields the file's text, as in Vite.
import { readFile } from "node:fs/promises";

export async function load(url, context, nextLoad) {
  if (url.startsWith("file:") && url.endsWith("?raw")) {
    const text = await readFile(new URL(url.slice(0, -4)), "utf8");
    return { format: "module", source: `export default ${JSON.stringify(text)};`, shortCircuit: true };
  }
  return nextLoad(url, context);
}
