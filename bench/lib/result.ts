import { z } from "zod";

/**
 * The one shape every benchmark reports in: a figure of ours beside a bare baseline measured in
 * the same run. With BENCH_JSON=1 a benchmark also prints its rows as one machine-readable line,
 * `BENCH_RESULT {"rows":[…]}`, which bench/run-all.ts collects into a single table.
 */
export const RESULT_PREFIX = "BENCH_RESULT ";

export const benchRowSchema = z.object({
  benchmark: z.string().min(1),
  ours: z.number().finite(),
  bare: z.number().finite(),
  unit: z.string().min(1),
});
export const benchResultSchema = z.object({ rows: z.array(benchRowSchema).min(1) });

export type BenchRow = z.infer<typeof benchRowSchema>;

/** Prints the rows as one `BENCH_RESULT` line when run under run-all (BENCH_JSON=1). */
export function emitResult(rows: BenchRow[]) {
  if (process.env.BENCH_JSON === "1") console.log(RESULT_PREFIX + JSON.stringify(benchResultSchema.parse({ rows })));
}

/** The rows of every `BENCH_RESULT` line in a benchmark's output; a malformed line throws. */
export function parseResultLines(output: string): BenchRow[] {
  return output
    .split("\n")
    .filter((line) => line.startsWith(RESULT_PREFIX))
    .flatMap((line) => benchResultSchema.parse(JSON.parse(line.slice(RESULT_PREFIX.length))).rows);
}

/** ours ÷ bare, or null when the bare figure is zero (a count of duplicates, say). */
export function ratioOf(row: BenchRow): number | null {
  return row.bare === 0 ? null : row.ours / row.bare;
}

/** Figures at a precision a reader can take in: whole numbers from 100 up, otherwise three significant digits. */
export function formatFigure(value: number): string {
  if (value === 0 || Math.abs(value) >= 100) return Math.round(value).toLocaleString("en-US");
  return Number(value.toPrecision(3)).toString();
}

export function formatRatio(row: BenchRow): string {
  const ratio = ratioOf(row);
  if (ratio === null) return row.ours === 0 ? "—" : "∞";
  return `${ratio >= 10 ? ratio.toFixed(1) : ratio.toFixed(2)}×`;
}

const HEADER = ["benchmark", "ours", "bare", "ratio", "unit"];
const cells = (row: BenchRow) => [row.benchmark, formatFigure(row.ours), formatFigure(row.bare), formatRatio(row), row.unit];

/** A plain-text table with aligned columns (figures right-aligned), for the terminal. */
export function formatTextTable(rows: BenchRow[]): string {
  const table = [HEADER, ...rows.map(cells)];
  const widths = HEADER.map((_, c) => Math.max(...table.map((r) => r[c].length)));
  const line = (r: string[]) => r.map((cell, c) => (c >= 1 && c <= 3 ? cell.padStart(widths[c]) : cell.padEnd(widths[c]))).join("  ").trimEnd();
  return [line(table[0]), widths.map((w) => "-".repeat(w)).join("  "), ...table.slice(1).map(line)].join("\n");
}

/** The same table in Markdown, for README.md. */
export function formatMarkdownTable(rows: BenchRow[]): string {
  const escape = (cell: string) => cell.replaceAll("|", "\\|");
  return [
    `| ${HEADER.join(" | ")} |`,
    "| --- | ---: | ---: | ---: | --- |",
    ...rows.map((row) => `| ${cells(row).map(escape).join(" | ")} |`),
  ].join("\n");
}
