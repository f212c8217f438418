import { defineConfig } from "vite";
import { readdirSync } from "node:fs";
import { resolve } from "node:path";

// Every notebooks/*.html is a page of the static multi-page build in dist/.
// SPANBOOK_PAGES=compare,index builds only those (for a quick look while other pages are in progress).
const root = resolve(import.meta.dirname, "notebooks");
const only = process.env.SPANBOOK_PAGES?.split(",");
const input = Object.fromEntries(
  readdirSync(root)
    .filter((f) => f.endsWith(".html") && (!only || only.includes(f.replace(/\.html$/, ""))))
    .map((f) => [f.replace(/\.html$/, ""), resolve(root, f)]),
);

export default defineConfig({
  root,
  base: "./",
  publicDir: resolve(import.meta.dirname, "notebooks/public"),
  build: { outDir: resolve(import.meta.dirname, "dist"), emptyOutDir: true, rollupOptions: { input }, chunkSizeWarningLimit: 800 },
  server: { host: "127.0.0.1", fs: { allow: [import.meta.dirname] } },
  preview: { host: "127.0.0.1", port: 4173 },
});
