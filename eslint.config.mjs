import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([".next/**", ".data/**", ".data-*/**", "node_modules/**", "drizzle/**", "test-results/**", "playwright-report/**"]),
  {
    // nerdamer stays behind cas/simplify; no other folder may import it.
    files: ["app/**", "components/**", "editor/**", "db/**"],
    rules: { "no-restricted-imports": ["error", { paths: [{ name: "nerdamer", message: "nerdamer is used only inside cas/." }] }] },
  },
]);
