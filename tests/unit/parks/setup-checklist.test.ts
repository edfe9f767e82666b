import { describe, expect, it } from "vitest";
import { setupChecklist } from "@/lib/parks/pure/setup-checklist";

// The checklist is product behaviour (issue #13), not a published rule: each item is ticked from data alone.
describe("set-up checklist", () => {
  const fresh = { settingsSaved: false, groundLayers: 0, trails: 0, members: 1, reports: 0, subscribers: 0 };

  it("a park just created has every step open, the first manager alone does not count as a team", () => {
    expect(setupChecklist("own-park", fresh).filter((i) => i.done)).toEqual([]);
  });

  it("ticks each step from its own fact", () => {
    const items = setupChecklist("own-park", { ...fresh, groundLayers: 2, members: 3, reports: 14 });
    expect(items.filter((i) => i.done).map((i) => i.key)).toEqual(["ground", "team", "check"]);
    expect(items.find((i) => i.key === "trail")?.href).toBe("/staff/own-park/trails/new");
  });
});
