import next from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const config = [
  ...next,
  ...nextTs,
  { ignores: [".next/**", "dist/**", "node_modules/**", "public/**", "test-results/**", "playwright-report/**", "tests/artifacts/**", "next-env.d.ts"] },
];
export default config;
