// ESLint (flat config): Next's rules (core web vitals, TypeScript, React hooks), no import cycles, the folder
// rule of DEVELOPERS.md (lib ← db ← server ← app; components beside app) and Drizzle's "an update or delete
// needs a where". `npm run lint` runs it with Prettier's check and knip.
import path from "node:path";
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import drizzle from "eslint-plugin-drizzle";

const root = import.meta.dirname;

/**
 * A client component ("use client" at the top, or a *-client.tsx file) imports values only from lib/ and
 * components/: code from db/ or server/ would land in the browser bundle. Type imports vanish at build, so
 * they may describe the rows a page hands over as props.
 */
const clientBoundary = {
  meta: {
    type: "problem",
    messages: { server: "A client component imports only lib/ (domain) and components/; '{{source}}' is server code." },
    schema: [],
  },
  create(context) {
    const file = context.filename;
    let client = /-client\.tsx$/.test(file);
    const serverSide = (source) => {
      const abs = source.startsWith("@/")
        ? path.join(root, source.slice(2))
        : source.startsWith(".")
          ? path.resolve(path.dirname(file), source)
          : null;
      if (!abs) return source === "server-only";
      const rel = path.relative(root, abs).split(path.sep)[0];
      return rel === "db" || rel === "server";
    };
    return {
      Program(node) {
        client ||= node.body.some((s) => s.type === "ExpressionStatement" && s.directive === "use client");
      },
      ImportDeclaration(node) {
        if (!client || node.importKind === "type") return;
        if (node.specifiers.length > 0 && node.specifiers.every((s) => s.importKind === "type")) return;
        if (serverSide(node.source.value))
          context.report({ node, messageId: "server", data: { source: node.source.value } });
      },
    };
  },
};

/** Who may import whom (paths resolved, so aliases and relative imports alike; type imports count too). */
const folderZones = [
  {
    target: "./lib",
    from: ["./db", "./server", "./app", "./components", "./scripts", "./tests"],
    message: "lib/ is the pure domain: it imports nothing above it.",
  },
  {
    target: "./db",
    from: "./server",
    except: ["./env.ts"],
    message: "db/ only reads and writes (it may read its settings from server/env.ts); services live in server/.",
  },
  { target: "./db", from: ["./app", "./components", "./scripts"], message: "db/ imports only lib/ and itself." },
  { target: "./server", from: ["./app", "./components", "./scripts"], message: "server/ never imports routes or UI." },
  {
    target: "./components",
    from: "./app",
    message: "Shared UI never imports routes; a piece that needs a route's action lives beside it in app/.",
  },
];

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([
    ".next*/**",
    "node_modules/**",
    "db/migrations/**",
    "playwright-report/**",
    "test-results/**",
    "coverage/**",
    ".pgdata*/**",
    ".run/**",
  ]),
  {
    plugins: { sagline: { rules: { "client-boundary": clientBoundary } } },
    // Packages are never part of a cycle: not parsing them keeps import/no-cycle fast.
    settings: { "import/ignore": ["node_modules"] },
    rules: {
      "import/no-cycle": ["error", { ignoreExternal: true }],
      "import/no-restricted-paths": ["error", { zones: folderZones }],
      "sagline/client-boundary": "error",
      "@typescript-eslint/no-unused-vars": [
        "error",
        {
          argsIgnorePattern: "^_",
          varsIgnorePattern: "^_",
          caughtErrorsIgnorePattern: "^_",
          destructuredArrayIgnorePattern: "^_",
          ignoreRestSiblings: true,
        },
      ],
      // Public pages with static islands (components/static-island.tsx) are reached by whole page loads, which
      // bring their markup once; a client-side navigation would have to load them again.
      "@next/next/no-html-link-for-pages": "off",
      // Says only that the React Compiler would skip a component using react-hook-form's watch() or TanStack
      // Table; this project does not run the compiler.
      "react-hooks/incompatible-library": "off",
    },
  },
  {
    // The domain runs anywhere, the browser included: no framework, no Node built-ins, no server guard.
    files: ["lib/**/*.{ts,tsx}"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["next", "next/*", "node:*", "server-only"],
              message: "lib/ is pure and browser-safe; this belongs in server/.",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["db/**/*.ts"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["next", "next/*"],
              message: "db/ never revalidates or reads requests; the service in server/ does.",
            },
          ],
        },
      ],
    },
  },
  {
    // Server components in components/ get their data through server/, never straight from db/.
    files: ["components/**/*.{ts,tsx}"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["@/db", "@/db/*"],
              allowTypeImports: true,
              message: "Read through server/ (cached, tagged reads).",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["db/**/*.ts", "server/**/*.ts", "scripts/**/*.ts", "tests/**/*.ts"],
    plugins: { drizzle },
    rules: {
      "drizzle/enforce-delete-with-where": ["error", { drizzleObjectName: ["db", "tx", "exec"] }],
      "drizzle/enforce-update-with-where": ["error", { drizzleObjectName: ["db", "tx", "exec"] }],
    },
  },
]);
