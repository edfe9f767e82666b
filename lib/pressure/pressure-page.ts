import "server-only";
/** What the "Today's pressure" page needs, read in parallel on the server. */
import { Op, fn, col } from "sequelize";
import type { Actor } from "@/lib/server/auth/permissions";
import { parkSummary } from "@/lib/parks/queries";
import { listSetups, type SetupView } from "@/lib/setups/setup-queries";
import { defaultTrailIds, trailsToday } from "@/lib/pressure/trails-today";
import { unitsFor } from "@/lib/accounts/units";
import { formatMass, formatPressure, formatTemperature, wheelSizeText, type MassUnit, type PressureUnit } from "@/lib/shared/units";
import { Park, Trail } from "@/models";
import { rideTemperatures } from "@/lib/weather/park-weather";
import { DEFAULT_RIDE_HOURS } from "@/lib/weather/pure/rules";
import { parkClockText, rideHoursText } from "@/lib/weather/pure/summary";

/** "29″ · 94 kg with bike · baseline 19.0 psi / 23.0 psi" — enough to tell setups apart. */
export function setupSummary(setup: SetupView, units: { pressure: PressureUnit; mass: MassUnit }): string {
  const unit = units.pressure;
  const wheels = setup.front.bsdMm === setup.rear.bsdMm ? wheelSizeText(setup.front.bsdMm) : `${wheelSizeText(setup.front.bsdMm)} / ${wheelSizeText(setup.rear.bsdMm)}`;
  const baseline = setup.baseline ? `baseline ${formatPressure(setup.baseline.frontKpa, unit)} / ${formatPressure(setup.baseline.rearKpa, unit)}` : "no baseline yet";
  return `${wheels} · ${formatMass(setup.riderMassKg + setup.bikeMassKg, units.mass, 0)} with bike · ${baseline}`;
}

/** The park asked for, else the one with the most trails (the natural first choice). */
async function choosePark(parks: Park[], slug: string | undefined): Promise<Park | null> {
  if (slug === "none") return null;
  const asked = parks.find((p) => p.slug === slug);
  if (asked) return asked;
  const counts = (await Trail.findAll({
    where: { archivedAt: { [Op.is]: null } },
    attributes: ["parkId", [fn("COUNT", col("id")), "count"]],
    group: ["parkId"],
    raw: true,
  })) as unknown as { parkId: string; count: string }[];
  const count = new Map(counts.map((c) => [c.parkId, Number(c.count)]));
  return [...parks].sort((a, b) => (count.get(b.id) ?? 0) - (count.get(a.id) ?? 0))[0] ?? null;
}

export async function pressurePageData(actor: Actor | null, parkSlug: string | undefined) {
  const [parks, units, setups] = await Promise.all([
    Park.findAll({ order: [["name", "ASC"]] }),
    unitsFor(actor),
    actor ? listSetups(actor) : Promise.resolve([] as SetupView[]),
  ]);
  const park = await choosePark(parks, parkSlug);
  const today = park ? await trailsToday(park) : null;
  const pick = (p: Park) => { const s = parkSummary(p); return { slug: s.slug, name: s.name, baseElevationM: s.baseElevationM, summitElevationM: s.summitElevationM }; };
  return {
    parks: parks.map(pick),
    park: park ? pick(park) : null,
    trails: (today?.trails ?? []).map(({ reportedAt: _at, ...t }) => t),
    anyReport: today?.anyReport ?? false,
    defaultTrailIds: today ? defaultTrailIds(today) : [],
    setups: setups.map((s) => ({ id: s.id, name: s.name, summary: setupSummary(s, units) })),
    units: { pressure: units.pressure, mass: units.mass },
  };
}

/** The park's stored weather as the band would use it when no temperature is typed (default ride hours), for the note above the form. */
export async function pressurePageWeather(parkSlug: string | undefined, now = new Date()): Promise<{ text: string } | null> {
  const park = parkSlug ? await Park.findOne({ where: { slug: parkSlug } }) : null;
  const temperatures = park ? await rideTemperatures(park, DEFAULT_RIDE_HOURS, now) : null;
  if (!park || !temperatures) return null;
  const measured = `${temperatures.stale ? "last measured" : "measured"} ${parkClockText(temperatures.measuredAt, now, park.timeZone)}`;
  return { text: `${park.name}: ${formatTemperature(temperatures.trailC)} forecast for ${rideHoursText(temperatures.hours)}, ${formatTemperature(temperatures.pumpC)} now (${measured}). Leave the temperatures blank to use these.` };
}
