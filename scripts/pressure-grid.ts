/**
 * Writes docs/pressure-grid.md: the starting estimate for a grid of riders against the
 * common-practice ranges (lib/pressure/pure/anchors.ts). Run: npm run docs:pressure-grid.
 * With --check it prints the count and the rows outside, and writes nothing.
 */
import { writeFileSync } from "node:fs";
import { gridLine, gridMarkdown, gridResults, gridSummary } from "@/lib/pressure/pure/grid-report";

const results = gridResults();
if (process.argv.includes("--check")) {
  console.log(gridSummary(results));
  for (const r of results.filter((x) => !x.inside)) console.log(gridLine(r));
} else {
  writeFileSync("docs/pressure-grid.md", gridMarkdown(results));
  console.log(`docs/pressure-grid.md: ${gridSummary(results)}`);
}
