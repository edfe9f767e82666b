import { describe, expect, it } from "vitest";
import { lineSketch } from "@/lib/trails/pure/line-sketch";

// Checked against the equirectangular projection by hand: at 60° N a degree of longitude is
// cos 60° = 0.5 of a degree of latitude, so a line 0.02° east and 0.01° north is drawn square.
describe("the trail line sketch", () => {
  it("keeps the shape true at the park's latitude, north up, fitted and centred", () => {
    const sketch = lineSketch({ type: "LineString", coordinates: [[10, 60], [10.02, 60], [10.02, 60.01]] }, 220, 220, 10)!;
    expect(sketch.start).toEqual([10, 210]);
    expect(sketch.end).toEqual([210, 10]);
    expect(sketch.path).toBe("M10,210L210,210L210,10");
  });

  it("draws each piece of a line in several pieces without joining the gap", () => {
    const sketch = lineSketch({ type: "MultiLineString", coordinates: [[[0, 0], [1, 0]], [[2, 0], [3, 0]]] }, 320, 200, 10)!;
    expect(sketch.path.match(/M/g)).toHaveLength(2);
  });

  it("has nothing to draw for a single point", () => {
    expect(lineSketch({ type: "LineString", coordinates: [[0, 0]] })).toBeNull();
  });
});
