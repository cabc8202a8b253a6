import { defineConfig } from "vitest/config";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.dirname(fileURLToPath(import.meta.url));

const alias = { "@": root, "server-only": path.join(root, "tests/helpers/server-only-stub.ts") };

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: "unit", include: ["tests/unit/**/*.test.{ts,tsx}"], environment: "node", testTimeout: 60_000 },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/helpers/integration-global-setup.ts"],
          setupFiles: ["tests/helpers/integration-setup.ts"],
          fileParallelism: false,
          // next-auth imports "next/server" without an extension (Next has no exports map); letting Vite
          // transform it resolves that the way Next's bundler does.
          server: { deps: { inline: ["next-auth"] } },
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
