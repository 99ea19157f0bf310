import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([".next/**", ".next-*/**", "scripts/.*", ".data/**", "node_modules/**", "next-env.d.ts", "db/migrations/**"]),
  {
    // The engine is a pure leaf: it runs in the browser and on the server alike.
    files: ["lib/formulation/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: ["react", "react-*", "next", "next/*"], message: "lib/formulation must stay free of React and Next.js." },
            { group: ["drizzle-orm", "drizzle-orm/*", "pg", "@/db/*", "@/lib/*", "../../db/*"], message: "lib/formulation must not touch the database or the app." },
          ],
        },
      ],
    },
  },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
]);
