import { describe, expect, it } from "vitest";
import { formatLength, formatParkTime, formatSurfaces } from "@/lib/map/pure/format";
import { applyMoveAnswer, moveRequest, undoRequest, type Pin } from "@/lib/map/pure/pin-moves";
import { statusKey, statusLabel } from "@/lib/map/pure/status";

describe("times in the park's own zone", () => {
  // America/Los_Angeles is UTC−8 in December (IANA time zone database).
  const now = new Date("2026-12-02T17:00:00Z"); // 09:00 on 2 Dec at the park
  const zone = "America/Los_Angeles";

  it("reads today, yesterday, an earlier date, or never", () => {
    expect(formatParkTime("2026-12-02T15:12:00Z", zone, now)).toBe("today 07:12");
    expect(formatParkTime("2026-12-02T02:40:00Z", zone, now)).toBe("yesterday 18:40");
    expect(formatParkTime("2026-11-28T15:05:00Z", zone, now)).toBe("Sat 28 Nov 07:05");
    expect(formatParkTime(null, zone, now)).toBe("never");
  });

  it("decides 'today' by the park's date, not the server's (UTC 2 Dec 07:30 is 1 Dec at the park)", () => {
    expect(formatParkTime("2026-12-02T07:30:00Z", zone, new Date("2026-12-02T07:45:00Z"))).toBe("today 23:30");
  });
});

describe("lengths, surfaces and status words", () => {
  it("formats what riders read", () => {
    expect([formatLength(740.4), formatLength(2449), formatLength(12_000)]).toEqual(["740 m", "2.4 km", "12.0 km"]);
    expect(formatSurfaces(["wet", "rocky"])).toBe("wet, rocky");
    expect(formatSurfaces([])).toBe("not reported today");
    expect([statusKey(null), statusLabel(null), statusLabel("closed")]).toEqual(["uninspected", "Not inspected today", "Closed"]);
  });
});

describe("staff pin moves and undo", () => {
  const feature: Pin = { key: "feature:f1", kind: "feature", id: "f1", lon: 8.5, lat: 46.8, label: "jump" };
  const hazard: Pin = { key: "hazard:h1", kind: "hazard", id: "h1", lon: 8.5, lat: 46.8, label: "Hazard", lockVersion: 3 };

  it("sends features and hazards to their own endpoints, hazards with the version they were read at", () => {
    expect(moveRequest(feature, { lon: 8.501, lat: 46.801 })).toEqual({ url: "/api/trail-features/f1/position", body: { lon: 8.501, lat: 46.801 } });
    expect(moveRequest(hazard, { lon: 8.501, lat: 46.801 })).toEqual({ url: "/api/hazards/h1/position", body: { lon: 8.501, lat: 46.801, lockVersion: 3 } });
  });

  it("undoes the last move by moving back, at the version that move produced", () => {
    const moved = applyMoveAnswer(hazard, { hazard: { id: "h1", lon: 8.502, lat: 46.802, lockVersion: 4 }, previous: { lon: 8.5, lat: 46.8 } });
    expect(moved.pin).toMatchObject({ lon: 8.502, lat: 46.802, lockVersion: 4 });
    expect(undoRequest(moved)).toEqual({ url: "/api/hazards/h1/position", body: { lon: 8.5, lat: 46.8, lockVersion: 4 } });
    const snapped = applyMoveAnswer(feature, { feature: { id: "f1", lon: 8.5004, lat: 46.8001, distanceAlongM: 31 }, previous: { lon: 8.5, lat: 46.8 } });
    expect(undoRequest(snapped)).toEqual({ url: "/api/trail-features/f1/position", body: { lon: 8.5, lat: 46.8 } });
  });

  it("refuses an answer without the new position", () => {
    expect(() => applyMoveAnswer(feature, { previous: { lon: 1, lat: 2 } })).toThrow(/new position/);
  });
});
