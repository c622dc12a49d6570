// ESLint with Next.js's own rules (core web vitals and TypeScript), flat config. `npm run lint`; npm test runs it first.
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const config = [
  ...nextVitals,
  ...nextTs,
  {
    rules: {
      // A leading underscore marks a value left out on purpose (destructuring a field away).
      "@typescript-eslint/no-unused-vars": ["warn", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", ignoreRestSiblings: true }],
    },
  },
  {
    // Tests and benchmarks read API answers as loose JSON and assert their shape themselves.
    files: ["tests/**", "bench/**"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  { ignores: [".next/**", ".tmp/**", ".data/**", "node_modules/**", "next-env.d.ts", "db/migrations/**"] },
];

export default config;
