import { describe, expect, it } from "vitest";
import { describeSetupEvent } from "@/lib/audit/pure/describe-setup";

// Wording of the activity page (issue #13: every team change is an audit event shown there); no published source.
describe("team and settings events in words", () => {
  it("names the person a change was about, or says they are gone", () => {
    expect(describeSetupEvent("staff.role", { from: "ranger", to: "manager" }, "Ida Quarry")).toBe("Made Ida Quarry manager (was ranger)");
    expect(describeSetupEvent("staff.remove", { role: "ranger" }, null)).toBe("Removed a former member from the team");
  });

  it("lists the settings that changed and the layer uploaded", () => {
    expect(describeSetupEvent("park.update", { changed: ["timeZone", "name"] }, null)).toBe("Changed the settings: timeZone, name");
    expect(describeSetupEvent("ground.replace", { layer: "lifts", features: 2 }, null)).toBe("Uploaded the lifts layer (2 shapes)");
  });
});
