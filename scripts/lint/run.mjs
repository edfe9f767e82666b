// `npm run lint [-- --fix] [paths…]`: ESLint on the project (eslint.config.mjs), stylish output,
// exit 1 on any error. `--report FILE` also writes the counts for scripts/test-summary.mjs.
import { writeFileSync } from "node:fs";
import { createRequire } from "node:module";

createRequire(import.meta.url)("./use-typescript6.cjs");
const { ESLint } = await import("eslint");

const args = process.argv.slice(2);
const fix = args.includes("--fix");
const reportAt = args.indexOf("--report");
const report = reportAt >= 0 ? args[reportAt + 1] : undefined;
const paths = args.filter((arg, i) => !arg.startsWith("--") && (reportAt < 0 || i !== reportAt + 1));

const started = performance.now();
const eslint = new ESLint({ fix, cache: true, cacheLocation: ".local/eslint-cache", cacheStrategy: "content" });
const results = await eslint.lintFiles(paths.length ? paths : ["."]);
if (fix) await ESLint.outputFixes(results);
const output = (await eslint.loadFormatter("stylish")).format(results);

const count = (key) => results.reduce((sum, result) => sum + result[key], 0);
const errors = count("errorCount");
const warnings = count("warningCount");
const seconds = ((performance.now() - started) / 1000).toFixed(1);
if (output) console.log(output);
console.log(`lint: ${results.length} files, ${errors} errors, ${warnings} warnings in ${seconds} s`);
if (report) writeFileSync(report, JSON.stringify({ files: results.length, errors, warnings, seconds: Number(seconds) }));
process.exit(errors > 0 ? 1 : 0);
