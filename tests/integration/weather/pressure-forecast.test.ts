// The pressure band with no temperature typed: the park's stored forecast (from the fake's storm
// fixture) is the trail's air, now's temperature the pump's, checked by hand against Gay-Lussac.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { pressureForRequest } from "@/lib/pressure/pressure-today";
import { refreshDueParks } from "@/lib/weather/refresh";
import { sequelize } from "@/models";
import { createTrail, reportToday, trailBike } from "../pressure/fixtures";
import { NOW, ownFake, stormPark } from "./fixtures";

let env: Awaited<ReturnType<typeof ownFake>>;
beforeAll(async () => {
  env = await ownFake();
});
afterAll(async () => {
  await env.fake.close();
  await sequelize.close();
});

const { name: _name, ...inlineSetup } = trailBike();

async function parkWithWeather() {
  const park = await stormPark();
  const trail = await createTrail(park, "Cedar Flow"); // 900–920 m: the day rides at 910 m
  await reportToday(park, trail, "open", ["damp"]);
  await refreshDueParks(env.service, { now: NOW, log: env.log, only: [park.id] });
  return park;
}

/** ISO 2533 standard atmosphere (troposphere): p = 101.325 kPa × (1 − 2.25577 × 10⁻⁵ · h)^5.25588. */
const isaKpa = (h: number) => 101.325 * (1 - 2.25577e-5 * h) ** 5.25588;

describe("pressure band from the park's weather", () => {
  it("uses 8 °C (the 10:00–14:00 forecast) on the trail and 3 °C now at the pump: Gay-Lussac in absolute pressure", async () => {
    const park = await parkWithWeather();
    const answer = await pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug } }, NOW);
    // Worked by hand: at 910 m, p_amb = 101.325 × (1 − 0.0205275)^5.25588 = 90.86 kPa (ISO 2533).
    const ambient = isaKpa(910);
    expect(ambient).toBeCloseTo(90.86, 1);
    // Gay-Lussac's law at fixed volume (p_abs ∝ T in kelvin): pump gauge = (target + p_amb) × 276.15 K / 281.15 K − p_amb.
    // E.g. a 25 psi (172.37 kPa) target: (172.37 + 90.86) × 0.98222 − 90.86 = 167.69 kPa = 24.3 psi to pump now.
    for (const wheel of [answer.front, answer.rear]) {
      const expected = ((wheel.targetKpa + ambient) * 276.15) / 281.15 - ambient;
      // The engine shows target and pump reading to 0.1 kPa: the two roundings allow at most 0.05 + 0.05 × 0.98.
      expect(Math.abs(wheel.pumpToKpa - expected)).toBeLessThanOrEqual(0.1);
      expect(wheel.pumpToKpa).toBeLessThan(wheel.targetKpa);
    }
    expect(answer.conditions?.weather).toMatchObject({ trailC: 8, pumpC: 3, hours: { from: 10, to: 14 }, stale: false });
    const reason = answer.reasons.find((r) => r.id === "pump-temperature");
    expect(reason?.text).toMatch(/^Trail 5 °C warmer than where you pump \(the park's weather: 8 °C forecast for 10:00–14:00, 3 °C now\): /);
  });

  it("takes the hours the rider picks: 14:00–16:00 is (8 + 7.5 + 7) / 3 = 7.5 °C", async () => {
    const park = await parkWithWeather();
    const answer = await pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug, rideHours: { from: 14, to: 16 } } }, NOW);
    expect(answer.conditions?.weather).toMatchObject({ trailC: 7.5, pumpC: 3 });
    const ambient = isaKpa(910);
    expect(Math.abs(answer.front.pumpToKpa - (((answer.front.targetKpa + ambient) * 276.15) / 280.65 - ambient))).toBeLessThanOrEqual(0.1);
  });

  it("a typed temperature wins: the weather is not used", async () => {
    const park = await parkWithWeather();
    const answer = await pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug, airTemperatureC: 12, pumpTemperatureC: 12 } }, NOW);
    expect(answer.conditions?.weather).toBeUndefined();
    expect(answer.front.pumpToKpa).toBe(answer.front.targetKpa);
  });

  it("refuses ride hours that run backwards", async () => {
    const park = await parkWithWeather();
    await expect(pressureForRequest(null, { ...inlineSetup, today: { parkSlug: park.slug, rideHours: { from: 15, to: 10 } } }, NOW)).rejects.toMatchObject({ status: 400, field: "today.rideHours.to" });
  });
});
