// Lets Node (the CLI and the benchmarks, run through tsx) import `file?raw` as its text, as Vite does.
import { register } from "node:module";

register("./raw-loader.mjs", import.meta.url);
