import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

// One config for the client build and for vitest. The client lives in src/, is served by the
// Express app from dist/ in production, and proxies /api to it in `npm run dev`.
export default defineConfig({
  plugins: [react(), tailwindcss()],
  root: "src",
  publicDir: "public",
  build: {
    outDir: "../dist",
    emptyOutDir: true,
    // React in one chunk, the other libraries in another, the app in its own: each stays
    // under the 500 kB warning and the vendor chunks stay cached across app releases.
    rolldownOptions: {
      output: {
        codeSplitting: {
          groups: [
            { name: "react", test: /node_modules[\\/](react|react-dom|scheduler)[\\/]/ },
            { name: "vendor", test: /node_modules[\\/]/ },
          ],
        },
      },
    },
  },
  server: { proxy: { "/api": `http://127.0.0.1:${process.env.PORT ?? 4310}` } },
  test: {
    root: ".",
    include: ["tests/**/*.test.{ts,tsx}"],
    environment: "node",
    globalSetup: ["tests/helpers/global-setup.ts"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: "forks",
    maxWorkers: 2,
  },
});
