import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// Layering (DEVELOPERS.md): app → components → lib, server code beside the client, contracts below both.
// tests/unit/layering.test.ts proves every rule here still fires. A test may import the app/ module it
// tests (tests/unit/brand-icons.test.ts reads app/manifest.ts); test helpers may not.

/** Pure lib/ folders: no React, no Next, no database; they run in the browser, the server and vitest. */
const PURE_LIB = [
  "refrigerants",
  "units",
  "psychro",
  "diagnosis",
  "service",
  "specs",
  "interview",
  "contracts",
  "vehicles",
  "credits",
  "owner",
  "repairs",
  "cases",
  "cautions",
  "casebook",
];
const PURE_LIB_PATHS = [
  ...PURE_LIB.map((folder) => `./lib/${folder}`),
  "./lib/errors.ts",
  "./lib/validation.ts",
];

/** Code that runs in the browser, or may: it never imports server-only modules, not even for a type. */
const CLIENT_SIDE = [
  "./components",
  "./lib/queries",
  "./lib/query-client.ts",
  "./machines",
  ...PURE_LIB_PATHS,
];

const layering = {
  files: ["**/*.{ts,tsx,mts,mjs}"],
  rules: {
    "import/no-cycle": ["error", { ignoreExternal: true }],
    "import/no-restricted-paths": [
      "error",
      {
        zones: [
          {
            target: [
              "./components",
              "./lib",
              "./machines",
              "./models",
              "./migrations",
              "./scripts",
              "./tests/support",
              "./tests/e2e/pages",
              "./bench",
              "./data",
              "./proxy.ts",
            ],
            from: "./app",
            message:
              "Nothing imports from app/: move what is shared into lib/ (contracts into lib/contracts/).",
          },
          {
            target: ["./lib", "./models", "./migrations"],
            from: ["./components", "./machines"],
            message: "lib/ sits below the screens and the interview machine: move what both need into lib/.",
          },
          {
            target: CLIENT_SIDE,
            from: ["./lib/server", "./lib/db", "./lib/mail", "./lib/storage", "./models", "./lib/env.ts"],
            message:
              "Client and pure code import no server-only module, types included: take the shape from lib/contracts/.",
          },
          {
            target: CLIENT_SIDE,
            from: "./lib/auth",
            except: ["./roles.ts", "./navigation.ts"],
            message: "Only the pure parts of lib/auth (roles, navigation) may reach client code.",
          },
        ],
      },
    ],
  },
};

const pureLib = {
  files: [...PURE_LIB.map((folder) => `lib/${folder}/**`), "lib/errors.ts", "lib/validation.ts"],
  rules: {
    "no-restricted-imports": [
      "error",
      {
        patterns: [
          {
            group: [
              "react",
              "react/*",
              "react-dom",
              "react-dom/*",
              "next",
              "next/*",
              "@tanstack/*",
              "@xstate/react",
            ],
            message:
              "Pure lib/ modules import neither React nor Next: they run the same in the browser, the server and vitest.",
          },
        ],
      },
    ],
  },
};

const config = [
  ...nextVitals,
  ...nextTs,
  layering,
  pureLib,
  {
    ignores: [
      ".next/**",
      ".data/**",
      "node_modules/**",
      "next-env.d.ts",
      "test-results/**",
      "playwright-report/**",
    ],
  },
];

export default config;
