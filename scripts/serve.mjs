// `npm start`: serves the built site (dist/) on 127.0.0.1 and prints the URL of the compare page.
// vite preview reads vite.config.ts, whose preview.headers send the Content-Security-Policy header.
import { preview } from "vite";

const server = await preview({ preview: { host: "127.0.0.1", port: Number(process.env.PORT ?? 4173), strictPort: false, open: false } });
const url = server.resolvedUrls?.local[0] ?? "http://127.0.0.1:4173/";
console.log(`spanbook is being served at ${url}compare.html (the demo study opens by default). Press Ctrl+C to stop.`);
