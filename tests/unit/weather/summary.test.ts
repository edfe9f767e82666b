import { describe, expect, it } from "vitest";
import { boardLine, forecastReason, measuredLine, morningCheckLine } from "@/lib/weather/pure/summary";

const ZONE = "America/Los_Angeles";
const NOW = new Date("2026-12-02T07:45:00-08:00");

describe("weather in words", () => {
  it("the morning check line, in park time", () => {
    const line = morningCheckLine(
      { rainSinceEveningMm: 14, since: new Date("2026-12-01T18:00:00-08:00").toISOString(), lastRainAt: new Date("2026-12-02T04:00:00-08:00").toISOString(), nowC: 3, overnight: { minC: -1.5, frost: true } },
      NOW,
      ZONE,
    );
    expect(line).toBe("Rain: 14 mm since yesterday 18:00, last in the hour to 04:00; 3 °C now, frost overnight (low −1.5 °C)");
  });

  it("says when there was no rain, and names the day of an older last rain", () => {
    const line = morningCheckLine({ rainSinceEveningMm: 0, since: new Date("2026-12-01T18:00:00-08:00").toISOString(), lastRainAt: new Date("2026-11-30T15:00:00-08:00").toISOString(), nowC: 9, overnight: { minC: 4, frost: false } }, NOW, ZONE);
    expect(line).toBe("No rain since yesterday 18:00 (last in the hour to Mon 15:00); 9 °C now, overnight low 4 °C");
  });

  it("the board line and its measured time; stale values say their age", () => {
    expect(boardLine({ today: { minC: 3, maxC: 8 }, rain24hMm: 14, nowC: 3 })).toBe("Today 3 °C to 8 °C · rain in the last 24 h: 14 mm");
    expect(boardLine({ today: null, rain24hMm: 0.4, nowC: -2 })).toBe("−2 °C now · rain in the last 24 h: 0.4 mm");
    const measuredAt = new Date("2026-12-02T07:30:00-08:00").toISOString();
    expect(measuredLine({ measuredAt, stale: false, age: "15 min" }, NOW, ZONE)).toBe("Measured 07:30");
    expect(measuredLine({ measuredAt, stale: true, age: "3 h" }, NOW, ZONE)).toBe("Last measured 07:30 (3 h ago): newer weather could not be fetched yet");
  });

  it("the pressure reason names the forecast hours and now", () => {
    expect(forecastReason({ trailC: 8, pumpC: 3, hours: { from: 10, to: 14 } }, "measured 07:30")).toContain("8 °C forecast on the trail for 10:00–14:00, 3 °C now where you pump (measured 07:30)");
  });
});
