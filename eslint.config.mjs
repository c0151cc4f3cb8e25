import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import prettier from "eslint-config-prettier/flat";
import drizzle from "eslint-plugin-drizzle";

/** The framework's own rules, Drizzle's guard against deletes and updates with no where clause, and Prettier owning layout. */
const config = [
  ...nextVitals,
  ...nextTs,
  {
    plugins: { drizzle },
    rules: {
      // Every statement in db/queries is scoped; a bare db.delete(t) or db.update(t).set() would touch every workshop.
      "drizzle/enforce-delete-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      "drizzle/enforce-update-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      // react-hook-form's watch() is used on purpose in a few forms; we do not run the React Compiler.
      "react-hooks/incompatible-library": "off",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" }],
    },
  },
  // Links prefetch on intent, not on sight (components/ui/link.tsx); the framework's own Link is wrapped there alone.
  {
    files: ["app/**", "components/**"],
    ignores: ["components/ui/link.tsx"],
    rules: {
      "no-restricted-imports": [
        "error",
        { paths: [{ name: "next/link", message: "Use Link from @/components/ui/link: it prefetches when the user shows intent." }] },
      ],
    },
  },
  // Tests read untyped JSON answers from the real server on purpose.
  { files: ["tests/**"], rules: { "@typescript-eslint/no-explicit-any": "off" } },
  prettier,
  {
    ignores: [
      ".next*/**",
      "node_modules/**",
      "data/**",
      "test-results/**",
      "screenshots/**",
      "db/migrations/**",
      "next-env.d.ts",
      "lib/bench/loaders.generated.ts",
    ],
  },
];

export default config;
