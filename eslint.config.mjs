import next from "eslint-config-next";

const config = [
  ...next,
  { ignores: ["node_modules/**", ".next/**", ".next-*/**", ".data/**", "drizzle/**", "next-env.d.ts"] },
];
export default config;
