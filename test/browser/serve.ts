// Vitest global setup for the browser project: serves the built site (dist/, made by `npm run build`
// before this project runs) with `vite preview` on 127.0.0.1, and stops it afterwards.
import { preview, type PreviewServer } from "vite";
import { existsSync } from "node:fs";
import { createServer } from "node:net";
import type { TestProject } from "vitest/node";

let server: PreviewServer | undefined;

/** A free port on 127.0.0.1, so parallel runs on one machine do not collide. */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const address = probe.address();
      const port = typeof address === "object" && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

export async function setup(project: TestProject): Promise<void> {
  if (!existsSync("dist/compare.html")) throw new Error("dist/ is missing: run `npm run build` before the browser tests");
  const port = await freePort();
  server = await preview({ preview: { host: "127.0.0.1", port, strictPort: true }, logLevel: "silent" });
  project.provide("baseUrl", `http://127.0.0.1:${port}`);
}

export async function teardown(): Promise<void> {
  await new Promise<void>((resolve) => (server ? server.httpServer.close(() => resolve()) : resolve()));
}

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
  }
}
