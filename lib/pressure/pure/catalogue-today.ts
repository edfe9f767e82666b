/** Catalogue: today's tweak (grip, support, protection, bound), limits, pump reading, feedback, sag. */
import { SURFACES } from "@/lib/pressure/pure/schemas";
import { COMMON_PRACTICE, frontRearPercent, kpaAndPsi, percent, type RuleEntry, type RuleSection } from "./catalogue-format";
import { STANDARD_CAUTIONS } from "./cautions";
import { FEEDBACK_RULES } from "./feedback";
import { SAG_PLAUSIBLE_PERCENT, SAG_TARGET_PERCENT } from "./sag";
import {
  ABSOLUTE_FLOOR_KPA, BASELINE_UNCERTAINTY, BERM_SUPPORT, CASING_VULNERABILITY, DAY_TEMPERATURE_SWING_C, ESTIMATE_UNCERTAINTY,
  FLOOR_DROP_HARD_HIT_CUT, FLOOR_DROP_INSERT_BONUS, FLOOR_DROP_TUBELESS, FLOOR_DROP_TUBES, GAUGE_ACCURACY_KPA, GAUGE_REPEATABILITY_KPA, INSERT_VULNERABILITY_FACTOR,
  JUMP_DROP_SUPPORT, PROTECTED_VULNERABILITY, ROCK_GARDEN_WEIGHT, ROCK_GRIP_PROTECTED, ROCK_PROTECTION, ROCKY_SURFACE_WEIGHT,
  SLICK_ROOTS, SLICK_SURFACES, SLICK_WOOD, STALE_REPORT_HOURS, STEP_MAX_KPA, STEP_MIN_KPA, SURFACE_GRIP, TUBE_VULNERABILITY,
  WHEEL_FLOOR_KPA, TWEAK_BOUND_KPA,
} from "./settings";

const gripRule = (surface: (typeof SURFACES)[number]): RuleEntry => {
  const value = SURFACE_GRIP[surface];
  const grips = value[0] === 0 && value[1] === 0;
  return {
    id: `grip-${surface}`,
    plain: grips
      ? `${surface[0].toUpperCase()}${surface.slice(1)} ground grips like dry: it moves the band up only when your baseline was set on less grippy ground.`
      : `${surface[0].toUpperCase()}${surface.slice(1)} ground grips less than dry: a little less air lets the tyre conform.`,
    numbers: `${frontRearPercent(value)} of the basis against dry, times the share of trails`,
    source: COMMON_PRACTICE,
  };
};

export const TODAY: RuleSection = {
  id: "today",
  title: "Today's trails",
  intro: "Each rule is worked out per planned trail from today's report and the trail's mapped features. Grip is weighted by the share of trails it applies to (a trail counts by its least grippy surface, compared with your baseline's ground); support and protection take the most demanding planned trail, because it is still ridden. Pace is already in the start, so it is not counted again.",
  rules: [
    ...SURFACES.map(gripRule),
    { id: "grip-slick-roots", plain: `Roots on ${SLICK_SURFACES.join(", ")} ground are slick: a little lower for grip.`, numbers: `${frontRearPercent(SLICK_ROOTS)} × share`, source: COMMON_PRACTICE },
    { id: "grip-slick-wood", plain: "Wooden features on such ground are slick too.", numbers: `${frontRearPercent(SLICK_WOOD)} × share`, source: COMMON_PRACTICE },
    { id: "grip-rocky-protected", plain: "Rocks where your casing or an insert already protects the rim: a little less air so the tyre wraps the rocks and grips.", numbers: `${frontRearPercent(ROCK_GRIP_PROTECTED)} × share of rocky trails; protected means exposure ≤ ${PROTECTED_VULNERABILITY}`, source: COMMON_PRACTICE },
    { id: "support-jump-drop", plain: "Jump and drop landings fold, roll or burp a soft tyre: more support, rear most. The biggest landing planned sets it, and the reason names its trail.", numbers: `${frontRearPercent(JUMP_DROP_SUPPORT)} of the basis`, source: COMMON_PRACTICE },
    { id: "support-berm", plain: "High-G berms do the same, less so (when no jump or drop is planned).", numbers: `${frontRearPercent(BERM_SUPPORT)} of the basis`, source: COMMON_PRACTICE },
    { id: "protection-rocks", plain: "Rocks where the rim is exposed: more air to protect rims and casings, more for tubes and light casings, less with an insert. The rockiest planned trail sets it, and the reason names it.", numbers: `${frontRearPercent(ROCK_PROTECTION)} of the basis × exposure × rock (rock garden ${ROCK_GARDEN_WEIGHT}, rocky ground ${ROCKY_SURFACE_WEIGHT}); exposure light ${CASING_VULNERABILITY.light}, trail ${CASING_VULNERABILITY.trail}, reinforced ${CASING_VULNERABILITY.reinforced}, downhill ${CASING_VULNERABILITY.downhill}; tubes +${TUBE_VULNERABILITY}; insert × ${INSERT_VULNERABILITY_FACTOR}`, source: COMMON_PRACTICE },
    { id: "relative-steps", plain: "Every step is a share of your pressure, so a child and a heavy rider get changes in proportion.", numbers: `Each step between ${STEP_MIN_KPA} and ${STEP_MAX_KPA} kPa`, source: { kind: "our choice", text: "Below the minimum a gauge cannot show it; above the maximum one rule would swamp the rest." } },
    { id: "small-adjustments", plain: "Changes under 0.2 psi on both wheels are summed into one line, so the list shows what matters.", numbers: "Under 0.2 psi (1.4 kPa) each", source: { kind: "our choice", text: "A gauge reads to about 0.5 psi." } },
    { id: "tweak-bound", plain: "Today's changes together adjust your baseline, they never replace it: what goes past the bound is listed and removed.", numbers: `± ${kpaAndPsi(TWEAK_BOUND_KPA)} per wheel`, source: { kind: "our choice", text: "A day's conditions should adjust, not replace, a baseline." } },
  ],
};

export const LIMITS: RuleSection = {
  id: "limits",
  title: "Limits, band and pump reading",
  intro: "Nothing is ever advised above the printed maximum of the tyre or the rim, whichever is lower.",
  rules: [
    { id: "limit-max", plain: "Never above the printed maximum of the tyre or the rim, whichever is lower, checked at the highest point of your planned trails (the gauge reads more up there) and at the pump: target, band and pump reading are all held there, with a caution.", numbers: "As printed on your tyre and rim", source: { kind: "safety", text: "Manufacturers' limits; ISO 2533 for the summit." } },
    { id: "limit-floor", plain: "A floor below which rim strikes and burping become likely for your load and tyre: the target is lifted to it, the band stops at it.", numbers: `Tyre pressed in by ${FLOOR_DROP_TUBELESS * 100} % (tubeless) or ${FLOOR_DROP_TUBES * 100} % (tubes) of its height under the riding loads, +${FLOOR_DROP_INSERT_BONUS * 100} % with an insert, −${FLOOR_DROP_HARD_HIT_CUT * 100} % when any planned trail has a drop or a rock garden (the worst trail counts); never below ${kpaAndPsi(ABSOLUTE_FLOOR_KPA)}; by wheel size (tubeless bead, and tubes alike) ${Object.entries(WHEEL_FLOOR_KPA).map(([bsd, kPa]) => `${bsd} mm ${kPa} kPa`).join(", ")}, nor below the tyre's printed minimum`, source: { kind: "common practice", text: "Common practice, no published source; the tubeless floor rising for small wheels is trade judgement." } },
    { id: "band-width", plain: "The band's ± is built from its parts, added as independent errors: how sure the start is (estimate, baseline or your rides), the gauge, the park's height span, and the day's temperature swing.", numbers: `estimate ${percent(ESTIMATE_UNCERTAINTY)}, baseline ${percent(BASELINE_UNCERTAINTY)}; gauge ±${kpaAndPsi(GAUGE_ACCURACY_KPA)} between gauges, ±${kpaAndPsi(GAUGE_REPEATABILITY_KPA)} on your own; half the gauge change from lowest to highest trail (ISO 2533); half of a ${DAY_TEMPERATURE_SWING_C} °C swing (Gay-Lussac); root-sum-square`, source: { kind: "common practice", text: "Common practice for the fractions and the swing; root-sum-square of independent errors is standard measurement practice." } },
    { id: "pump-temperature", plain: "Pumping somewhere warmer than the trail: pump higher, the tyre loses pressure as it cools (and the other way round).", numbers: "Gay-Lussac's law at the trail's air pressure", source: { kind: "published", text: "Gay-Lussac's law (see Physics)." } },
    { id: "pump-elevation", plain: "Riding higher than where you pump: pump lower, the gauge reads more where the air is thinner.", numbers: "ISO 2533 air pressure at both elevations; the park's midpoint unless you give the ride elevation", source: { kind: "published", text: "ISO 2533:1975." } },
    { id: "pump-small", plain: "Pump-reading changes under 0.2 psi, summed into one line.", numbers: "Under 0.2 psi (1.4 kPa) each", source: { kind: "our choice", text: "A gauge reads to about 0.5 psi." } },
    { id: "pump-limit", plain: "The pump reading stays between zero and the printed maximum.", numbers: "—", source: { kind: "safety", text: "Manufacturers' limits." } },
    { id: "report-age", plain: "A trail without a report today is unknown: it counts in the share but adds nothing, and you are told so. Older reports get a caution.", numbers: `Older than ${STALE_REPORT_HOURS} h`, source: { kind: "our choice", text: "Conditions change; say when they are not known." } },
  ],
};

export const AFTER_THE_RIDE: RuleSection = {
  id: "after-the-ride",
  title: "After the ride, and suspension",
  intro: "A ride log gives exactly one suggested change, safety first: change one thing at a time. It starts from what you actually ran, on your baseline's ground, and never goes past the printed maximum or below the floor.",
  rules: [
    ...FEEDBACK_RULES.map((rule, i) => ({
      id: `feedback-${rule.symptom}`,
      plain: `Priority ${i + 1}: ${rule.symptom.replace(/-/g, " ")} — ${rule.fraction > 0 ? "more" : "less"} air than you ran, because ${rule.why}.${rule.fraction > 0 ? " On both wheels, both change." : ""}${rule.symptom === "sliding" ? " Not when the ground was slicker than your baseline's: that is the ground, and today's band already allows for it." : ""}`,
      numbers: `${percent(rule.fraction)} of the pressure run, ${STEP_MIN_KPA}–${STEP_MAX_KPA} kPa; ties go to the front`,
      source: COMMON_PRACTICE,
    })),
    { id: "sag-rear", plain: "Rear sag: the shock's travel used with you sitting on the bike, as a share of its stroke.", numbers: `${SAG_TARGET_PERCENT.rear.min}–${SAG_TARGET_PERCENT.rear.max} % of the shock stroke`, source: { kind: "common practice", text: "Common practice, no published standard (some guides say 20–30 %); follow the maker's figure." } },
    { id: "sag-fork", plain: "Fork sag, the same at the front.", numbers: `${SAG_TARGET_PERCENT.fork.min}–${SAG_TARGET_PERCENT.fork.max} % of the fork travel`, source: { kind: "common practice", text: "Common practice, no published standard; follow the maker's figure." } },
    { id: "sag-remeasure", plain: "A sag below the plausible range or above it is more likely a slipped O-ring or a misread than a setting: measure again.", numbers: `Below ${SAG_PLAUSIBLE_PERCENT.min} % or above ${SAG_PLAUSIBLE_PERCENT.max} %`, source: COMMON_PRACTICE },
  ],
};

export const CAUTIONS: readonly string[] = STANDARD_CAUTIONS;
