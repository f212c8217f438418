// Vitest global setup for the browser project: serves the built site (dist/, made by `npm run build`
// before this project runs) with `vite preview` on 127.0.0.1, and stops it afterwards.
import { preview, type PreviewServer } from "vite";
import { existsSync } from "node:fs";
import type { TestProject } from "vitest/node";

export const PORT = 4183;
let server: PreviewServer | undefined;

export async function setup(project: TestProject): Promise<void> {
  if (!existsSync("dist/compare.html")) throw new Error("dist/ is missing: run `npm run build` before the browser tests");
  server = await preview({ preview: { host: "127.0.0.1", port: PORT, strictPort: true }, logLevel: "silent" });
  project.provide("baseUrl", `http://127.0.0.1:${PORT}`);
}

export async function teardown(): Promise<void> {
  await new Promise<void>((resolve) => (server ? server.httpServer.close(() => resolve()) : resolve()));
}

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
  }
}
