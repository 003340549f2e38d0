// ESLint for Echoline: typescript-eslint's recommended rules plus the layer rules of DEVELOPERS.md,
// enforced with eslint-plugin-boundaries so a wrong import fails `npm test` instead of a review.
import tseslint from "typescript-eslint";
import boundaries from "eslint-plugin-boundaries";

// The folders of the fixed top level. The first matching pattern wins, so lib/server/ is its own
// element before the rest of lib/.
const ELEMENTS = [
  { type: "lib-server", pattern: "lib/server/**", partialMatch: false },
  { type: "lib", pattern: "lib/**", partialMatch: false },
  { type: "app", pattern: "app/**", partialMatch: false },
  { type: "components", pattern: "components/**", partialMatch: false },
  { type: "db", pattern: "db/**", partialMatch: false },
  { type: "migrations", pattern: "migrations/**", partialMatch: false },
  { type: "workers", pattern: "workers/**", partialMatch: false },
  { type: "tests", pattern: "tests/**", partialMatch: false },
];

// Framework packages: the web layer's business. lib/ is domain logic that the worker, the CLI and
// the tests run without Next.js, so only lib/server/ may name them.
// A module's `source` is its package name ("next" for "next/navigation").
const FRAMEWORK = ["next", "next-auth", "@auth/*", "react", "react-dom"];

const layerPolicies = [
  {
    from: { element: { type: "lib" } },
    disallow: { to: { element: { types: { anyOf: ["app", "components", "workers"] } } } },
    message:
      "lib/ is domain logic: it may not import app/, components/ or workers/ (move the code into lib/ or pass it in).",
  },
  {
    from: { element: { type: "lib" } },
    disallow: { to: { module: { origin: "external", source: FRAMEWORK } } },
    message:
      "lib/ knows no framework: next, next-auth and react belong in lib/server/ (the one exception), app/ or components/.",
  },
  {
    // The one exception: lib/server/ knows Next.js and next-auth, but still not the layers above it.
    from: { element: { type: "lib-server" } },
    disallow: { to: { element: { types: { anyOf: ["app", "components", "workers"] } } } },
    message: "lib/server/ may use Next.js and next-auth but may not import app/, components/ or workers/.",
  },
  {
    from: { element: { type: "components" } },
    disallow: { to: { element: { type: "db" } } },
    message:
      "components/ never touch the database: take types and labels from lib/vocabulary.ts, data from a route or a page.",
  },
  {
    from: { element: { type: "workers" } },
    disallow: { to: { element: { type: "app" } } },
    message: "workers/ may not import app/: shared code lives in lib/.",
  },
];

export default tseslint.config(
  {
    ignores: [
      "node_modules/",
      ".next/",
      ".data/",
      "coverage/",
      "fonts/",
      "next-env.d.ts",
      "tests/fixtures/",
      "**/*.mjs",
      "**/*.js",
    ],
  },
  ...tseslint.configs.recommended,
  {
    files: ["**/*.ts", "**/*.tsx"],
    plugins: { boundaries },
    settings: {
      "boundaries/elements": ELEMENTS,
      "boundaries/include": ["**/*.ts", "**/*.tsx"],
      // "@/..." is tsconfig's path alias: the TypeScript resolver reads it from tsconfig.json.
      "import/resolver": { typescript: { alwaysTryTypes: true, project: "./tsconfig.json" } },
    },
    rules: {
      // checkAllOrigins: the framework rule is about packages (external origins), not only our folders.
      "boundaries/dependencies": [2, { default: "allow", checkAllOrigins: true, policies: layerPolicies }],
      // Deliberately unused arguments and destructured-away fields start with "_" (or are rest
      // siblings, e.g. dropping password_hash before a row leaves the server).
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", ignoreRestSiblings: true, caughtErrors: "none" },
      ],
    },
  },
);
