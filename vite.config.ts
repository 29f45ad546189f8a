import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

const apiPort = Number(process.env.PORT ?? 3000);

// One config for the client build, the dev server and the three vitest projects.
export default defineConfig({
  plugins: [react(), tailwindcss()],
  server: {
    host: "127.0.0.1",
    proxy: { "/api": `http://127.0.0.1:${apiPort}` },
  },
  build: { outDir: "dist/client", sourcemap: false },
  test: {
    projects: [
      {
        test: {
          name: "shared",
          include: ["shared/**/*.test.ts", "src/**/*.test.ts"],
          benchmark: { include: ["tests/bench/**/*.bench.ts"] },
          environment: "node",
          setupFiles: ["tests/support/fail-on-console-error.ts"],
        },
      },
      {
        test: {
          name: "server",
          include: ["tests/api/**/*.test.ts", "server/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/support/global-setup.ts"],
          setupFiles: ["tests/support/fail-on-console-error.ts"],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
