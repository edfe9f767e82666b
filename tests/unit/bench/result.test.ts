import { describe, expect, it } from "vitest";
import { formatFigure, formatMarkdownTable, formatRatio, formatTextTable, parseResultLines, ratioOf, type BenchRow } from "@/bench/lib/result";

// The benchmark table's plumbing only: no timings are asserted here (benchmarks print figures).
const throughput: BenchRow = { benchmark: "board API: throughput", ours: 240, bare: 800, unit: "req/s" };
const duplicates: BenchRow = { benchmark: "fan-out: duplicates", ours: 0, bare: 0, unit: "messages" };

describe("parseResultLines", () => {
  it("collects the rows of every BENCH_RESULT line and ignores other output", () => {
    const output = ["GPX: 100,000 points", `BENCH_RESULT ${JSON.stringify({ rows: [throughput] })}`, "ratio 0.3", `BENCH_RESULT ${JSON.stringify({ rows: [duplicates] })}`, ""].join("\n");
    expect(parseResultLines(output)).toEqual([throughput, duplicates]);
  });

  it("refuses a malformed result line rather than dropping it", () => {
    expect(() => parseResultLines('BENCH_RESULT {"rows":[{"benchmark":"x","ours":"fast","bare":1,"unit":"ms"}]}')).toThrow();
    expect(() => parseResultLines("BENCH_RESULT {not json")).toThrow();
    expect(() => parseResultLines('BENCH_RESULT {"rows":[]}')).toThrow();
  });

  it("finds nothing in output without result lines", () => {
    expect(parseResultLines("figures only\n")).toEqual([]);
  });
});

describe("ratios and figures", () => {
  it("divides ours by bare", () => {
    expect(ratioOf(throughput)).toBeCloseTo(0.3, 10);
    expect(formatRatio(throughput)).toBe("0.30×");
    expect(formatRatio({ ...throughput, ours: 4532, bare: 1909 })).toBe("2.37×");
    expect(formatRatio({ ...throughput, ours: 130, bare: 10 })).toBe("13.0×");
  });

  it("has no ratio when the bare figure is zero", () => {
    expect(ratioOf(duplicates)).toBeNull();
    expect(formatRatio(duplicates)).toBe("—");
    expect(formatRatio({ ...duplicates, ours: 3 })).toBe("∞");
  });

  it("rounds large figures and keeps three significant digits on small ones", () => {
    expect(formatFigure(1234.6)).toBe("1,235");
    expect(formatFigure(239.4)).toBe("239");
    expect(formatFigure(97.84)).toBe("97.8");
    expect(formatFigure(0.12345)).toBe("0.123");
    expect(formatFigure(0)).toBe("0");
  });
});

describe("tables", () => {
  it("prints aligned text columns, one line per row", () => {
    const lines = formatTextTable([throughput, duplicates]).split("\n");
    expect(lines).toHaveLength(4);
    expect(lines[0]).toMatch(/^benchmark\s+ours\s+bare\s+ratio\s+unit$/);
    expect(lines[2]).toMatch(/^board API: throughput\s+240\s+800\s+0\.30×\s+req\/s$/);
    expect(lines[3]).toMatch(/^fan-out: duplicates\s+0\s+0\s+—\s+messages$/);
    // Figures are right-aligned: every row's "ours" ends in the same column.
    expect(lines[2].indexOf("240") + 3).toBe(lines[3].indexOf("0  ") + 1);
  });

  it("prints Markdown with escaped pipes", () => {
    const markdown = formatMarkdownTable([{ ...throughput, benchmark: "a | b" }]);
    expect(markdown.split("\n")).toEqual(["| benchmark | ours | bare | ratio | unit |", "| --- | ---: | ---: | ---: | --- |", "| a \\| b | 240 | 800 | 0.30× | req/s |"]);
  });
});
