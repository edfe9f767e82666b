/**
 * The fake weather service's scenarios (our own invention), chosen by the coordinate asked for.
 * Each gives temperature (°C) and rain (mm in the hour ending at the stamp) by park-local day
 * (−2, −1, 0 = today) and hour. "Now" is a fixed value per scenario, so tests can work by hand.
 */
export type FixtureName = "dry-week" | "overnight-storm" | "freeze-thaw";
export type Fixture = {
  name: FixtureName;
  nowC: number;
  temperatureC: (day: number, hour: number) => number;
  precipitationMm: (day: number, hour: number) => number;
};

const byHour = (values: number[]) => (_day: number, hour: number) => values[hour];

/** Mild and dry: 4 °C before dawn to 14 °C mid-afternoon, no rain. */
const dryWeek: Fixture = {
  name: "dry-week",
  nowC: 9,
  temperatureC: (_day, hour) => Math.round((9 + 5 * Math.cos(((hour - 15) / 24) * 2 * Math.PI)) * 10) / 10,
  precipitationMm: () => 0,
};

/**
 * Rain from yesterday evening to 04:00 today: 9.5 mm in the hours ending 19:00–23:00 yesterday,
 * 4.5 mm in those ending 00:00–04:00 today (14.0 mm), and 1.2 mm two days ago in the afternoon.
 * Today 3 °C at night, 8 °C every hour from 10:00 to 14:00 (so their mean is 8 °C); now 3 °C.
 */
const STORM_YESTERDAY: Record<number, number> = { 19: 1.0, 20: 2.0, 21: 2.5, 22: 2.5, 23: 1.5 };
const STORM_TODAY: Record<number, number> = { 0: 1.5, 1: 1.0, 2: 1.0, 3: 0.6, 4: 0.4 };
const overnightStorm: Fixture = {
  name: "overnight-storm",
  nowC: 3,
  temperatureC: byHour([4, 4, 3.5, 3, 3, 3, 3, 3.5, 4.5, 6, 8, 8, 8, 8, 8, 7.5, 7, 6, 5.5, 5, 5, 4.5, 4.5, 4]),
  precipitationMm: (day, hour) => (day === -1 ? (STORM_YESTERDAY[hour] ?? 0) : day === 0 ? (STORM_TODAY[hour] ?? 0) : hour === 14 ? 0.8 : hour === 15 ? 0.4 : 0),
};

/** Clear and cold: −6 °C before dawn, 5 °C at 13:00–14:00; the 10:00–14:00 mean is 4 °C; now −4 °C; a trace of snow two days ago. */
const freezeThaw: Fixture = {
  name: "freeze-thaw",
  nowC: -4,
  temperatureC: byHour([-4, -5, -5, -6, -6, -6, -5, -4, -2, 0, 2, 3.5, 4.5, 5, 5, 4, 2.5, 1, 0, -1, -2, -2.5, -3, -3.5]),
  precipitationMm: (day, hour) => (day === -2 && hour === 6 ? 0.2 : 0),
};

/** Which scenario answers which place: the demo parks (seeders/20261201-0001), and everything else dry. */
const PLACES: { latitude: number; longitude: number; fixture: Fixture }[] = [
  { latitude: 47.3, longitude: -121.94, fixture: overnightStorm },
  { latitude: 39.02, longitude: -105.61, fixture: freezeThaw },
];

export const FIXTURES: Record<FixtureName, Fixture> = { "dry-week": dryWeek, "overnight-storm": overnightStorm, "freeze-thaw": freezeThaw };

/** The scenario within 0.05° of the coordinate, else the dry week. */
export function fixtureFor(latitude: number, longitude: number): Fixture {
  return PLACES.find((p) => Math.abs(p.latitude - latitude) < 0.05 && Math.abs(p.longitude - longitude) < 0.05)?.fixture ?? dryWeek;
}
