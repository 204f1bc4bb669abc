// @ts-nocheck
import next from "eslint-config-next";

// One direction of imports: app → components → lib/db → calc. Each layer below may not reach up.
const APP = { group: ["@/app", "@/app/**", "**/app/**"], message: "Only app/ imports app/: pass server actions in as props, or move the code down a layer." };
const COMPONENTS = { group: ["@/components", "@/components/**", "**/components/**"], message: "lib/, db/ and calc/ sit below components/ and never import it." };
const DB = { group: ["@/db", "@/db/**", "**/db/**"], message: "lib/ is framework-free: no database (db/ may import lib/, not the reverse)." };
const FRAMEWORK = { group: ["react", "react/**", "react-dom", "react-dom/**", "next", "next/**", "next-auth", "next-auth/**", "server-only", "drizzle-orm", "drizzle-orm/**", "pg"], message: "lib/ is framework-free: no React, Next.js or database packages." };
const restrict = (...patterns) => ({ rules: { "no-restricted-imports": ["error", { patterns }] } });

const config = [
  ...next,
  { ignores: ["node_modules/**", ".next/**", ".next-*/**", ".data/**", "drizzle/**", "next-env.d.ts"] },
  { files: ["components/**", "scripts/**"], ...restrict(APP) },
  { files: ["db/**"], ...restrict(APP, COMPONENTS) },
  { files: ["lib/**"], ...restrict(APP, COMPONENTS, DB, FRAMEWORK) },
  {
    // calc/ is the model: it imports only itself (relative paths) and zod.
    files: ["calc/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [{ regex: "^(?!\\.{1,2}/|zod$)", message: "calc/ imports only itself (relative paths) and zod." }] },
      ],
    },
  },
];
export default config;
