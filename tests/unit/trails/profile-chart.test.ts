import { describe, expect, it } from "vitest";
import { elevationAt, niceStep, profileChart, ticksBetween } from "@/lib/trails/pure/profile-chart";
import { M_PER_FT } from "@/lib/shared/units";

// Axis steps of 1, 2 or 5 × 10^n: Heckbert, "Nice numbers for graph labels", Graphics Gems (1990) — from memory.
describe("axis steps", () => {
  it.each([
    [2.41, 5, 0.5],
    [680, 5, 200],
    [100, 5, 20],
    [9, 4, 5],
    [0.35, 5, 0.1],
  ])("range %d in %d ticks → step %d", (range, count, step) => {
    expect(niceStep(range, count)).toBeCloseTo(step, 12);
  });

  it("lists ticks on the step, ends included when they fall on it", () => {
    expect(ticksBetween(0, 2.41, 0.5)).toEqual([0, 0.5, 1, 1.5, 2]);
    expect(ticksBetween(600, 1400, 200)).toEqual([600, 800, 1000, 1200, 1400]);
    expect(ticksBetween(0.3, 0.9, 0.3)).toEqual([0.3, 0.6, 0.9]);
  });
});

describe("profileChart", () => {
  const profile = [
    { dM: 0, eleM: 1320 },
    { dM: 1200, eleM: 1000 },
    { dM: 2410, eleM: 640 },
  ];

  it("maps the start to the left edge and the highest point to the top of its rounded axis", () => {
    const chart = profileChart(profile, "metric")!;
    expect(chart.line.startsWith(`M${chart.plot.left},`)).toBe(true);
    expect(chart.line.endsWith(`L${chart.plot.right},${chart.plot.bottom - ((640 - 600) / (1400 - 600)) * (chart.plot.bottom - chart.plot.top)}`)).toBe(true);
    expect(chart.yTicks.map((t) => t.label)).toEqual(["600", "800", "1000", "1200", "1400"]);
    expect(chart.xTicks.map((t) => t.label)).toEqual(["0", "1", "2"]);
    expect([chart.xUnit, chart.yUnit]).toEqual(["km", "m"]);
    expect(chart.area.endsWith("Z")).toBe(true);
    expect(chart.summary).toContain("1320 m at the start");
    expect(chart.summary).toContain("2.41 km");
  });

  it("puts a feature's mark on the line at its distance, the elevation interpolated linearly between points", () => {
    // 600 m along: halfway from 1320 m to 1000 m, so 1160 m (plain linear interpolation).
    expect(elevationAt(profile, 600)).toBe(1160);
    expect(elevationAt(profile, -5)).toBe(1320);
    expect(elevationAt(profile, 9_999)).toBe(640);
    const chart = profileChart(profile, "metric", undefined, [{ dM: 600, label: "1" }])!;
    const { plot } = chart;
    const x = plot.left + (0.6 / 2.41) * (plot.right - plot.left);
    const y = plot.bottom - ((1160 - 600) / (1400 - 600)) * (plot.bottom - plot.top);
    expect(chart.marks).toHaveLength(1);
    expect(chart.marks[0].label).toBe("1");
    expect(chart.marks[0].x).toBeCloseTo(x, 0);
    expect(chart.marks[0].y).toBeCloseTo(y, 0);
  });

  it("draws in miles and feet for imperial viewers", () => {
    const chart = profileChart(profile, "imperial")!;
    expect([chart.xUnit, chart.yUnit]).toEqual(["mi", "ft"]);
    // 1320 m = 4330.7 ft, 640 m = 2099.7 ft (ft = 0.3048 m exactly): a 500 ft step from 2000 to 4500.
    expect(1320 / M_PER_FT).toBeCloseTo(4330.7, 1);
    expect(chart.yTicks[0].label).toBe("2000");
    expect(chart.yTicks.at(-1)!.label).toBe("4500");
    expect(chart.summary).toContain("4331 ft");
  });

  it("gives a flat trail an axis and has nothing to draw without elevation", () => {
    const flat = profileChart([{ dM: 0, eleM: 900 }, { dM: 500, eleM: 900.5 }], "metric")!;
    expect(flat.yTicks.length).toBeGreaterThanOrEqual(2);
    expect(flat.line).not.toContain("NaN");
    expect(profileChart([], "metric")).toBeNull();
  });
});
