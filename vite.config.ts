import { defineConfig, type Plugin } from "vite";
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

/**
 * The pages' Content-Security-Policy. Scripts only from the site's own files (no inline script, no
 * eval); module workers (span study, risk) from the site too. Styles allow 'unsafe-inline' because
 * Observable Plot writes style attributes and <style> elements into every chart. Images allow
 * blob: (a chart is drawn from a blob URL to make its PNG) and data:. Nothing is fetched from
 * elsewhere; no plugins; forms and <base> stay on the site.
 */
export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join("; ");

/** As a header the policy also forbids framing the site (frame-ancestors is ignored in a meta tag). */
export const CONTENT_SECURITY_POLICY_HEADER = `${CONTENT_SECURITY_POLICY}; frame-ancestors 'none'`;

/** Puts the policy into every page as a meta tag, so a copy of dist/ on any static host carries it. */
function contentSecurityPolicyMeta(): Plugin {
  return {
    name: "spanbook-csp-meta",
    transformIndexHtml: () => [{ tag: "meta", attrs: { "http-equiv": "Content-Security-Policy", content: CONTENT_SECURITY_POLICY }, injectTo: "head-prepend" }],
  };
}

export default defineConfig({
  root,
  base: "./",
  publicDir: resolve(import.meta.dirname, "notebooks/public"),
  plugins: [contentSecurityPolicyMeta()],
  build: { outDir: resolve(import.meta.dirname, "dist"), emptyOutDir: true, rollupOptions: { input }, chunkSizeWarningLimit: 800 },
  server: { host: "127.0.0.1", fs: { allow: [import.meta.dirname] } },
  // `npm start` (scripts/serve.mjs) and the browser tests serve dist/ through vite preview: the header.
  preview: { host: "127.0.0.1", port: 4173, headers: { "Content-Security-Policy": CONTENT_SECURITY_POLICY_HEADER } },
});
