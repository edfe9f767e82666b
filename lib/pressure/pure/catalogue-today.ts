/** Catalogue: today's tweak (grip, support, protection, bound), limits, pump reading, feedback, sag. */
import { SURFACES } from "@/lib/pressure/pure/schemas";
import { COMMON_PRACTICE, frontRear, kpaAndPsi, type RuleEntry, type RuleSection } from "./catalogue-format";
import { STANDARD_CAUTIONS } from "./cautions";
import { FEEDBACK_RULES } from "./feedback";
import { SAG_TARGET_PERCENT } from "./sag";
import {
  ABSOLUTE_FLOOR_KPA, BAND_FRACTION_BASELINE, BAND_FRACTION_ESTIMATE, BAND_MAX_HALF_KPA, BAND_MIN_HALF_KPA, BERM_SUPPORT_KPA,
  CASING_VULNERABILITY, FLOOR_DROP_INSERT_BONUS, FLOOR_DROP_TUBELESS, FLOOR_DROP_TUBES, INSERT_VULNERABILITY_FACTOR,
  JUMP_DROP_SUPPORT_KPA, PACE_LOAD_FACTOR, ROCK_PROTECTION_KPA, SLICK_ROOTS_KPA, SLICK_SURFACES, SLICK_WOOD_KPA,
  STALE_REPORT_HOURS, SURFACE_GRIP_KPA, TUBE_VULNERABILITY, TWEAK_BOUND_KPA,
} from "./settings";

const gripRule = (surface: (typeof SURFACES)[number]): RuleEntry => {
  const value = SURFACE_GRIP_KPA[surface];
  const grips = value[0] === 0 && value[1] === 0;
  return {
    id: `grip-${surface}`,
    plain: grips
      ? `${surface[0].toUpperCase()}${surface.slice(1)} ground grips like dry: it moves the band up only when your baseline was set on less grippy ground.`
      : `${surface[0].toUpperCase()}${surface.slice(1)} ground grips less than dry: a little less air lets the tyre conform.`,
    numbers: `${frontRear(value)} against dry, times the share of trails`,
    source: COMMON_PRACTICE,
  };
};

export const TODAY: RuleSection = {
  id: "today",
  title: "Today's trails",
  intro: "Each rule is worked out per planned trail from today's report and the trail's mapped features, weighted by the share of trails it applies to. A trail counts by its least grippy surface, compared with your baseline's ground.",
  rules: [
    ...SURFACES.map(gripRule),
    { id: "grip-slick-roots", plain: `Roots on ${SLICK_SURFACES.join(", ")} ground are slick: a little lower for grip.`, numbers: `${frontRear(SLICK_ROOTS_KPA)} × share`, source: COMMON_PRACTICE },
    { id: "grip-slick-wood", plain: "Wooden features on such ground are slick too.", numbers: `${frontRear(SLICK_WOOD_KPA)} × share`, source: COMMON_PRACTICE },
    { id: "support-jump-drop", plain: "Jump and drop landings fold, roll or burp a soft tyre: more support, rear most. A trail counts once, by its biggest feature.", numbers: `${frontRear(JUMP_DROP_SUPPORT_KPA)} × pace × share`, source: COMMON_PRACTICE },
    { id: "support-berm", plain: "High-G berms do the same, less so.", numbers: `${frontRear(BERM_SUPPORT_KPA)} × pace × share`, source: COMMON_PRACTICE },
    { id: "protection-rocks", plain: "Rocky ground and rock gardens: more air to protect rims and casings, more for tubes and light casings, less with an insert.", numbers: `${frontRear(ROCK_PROTECTION_KPA)} × exposure × pace × share; exposure light ${CASING_VULNERABILITY.light}, trail ${CASING_VULNERABILITY.trail}, reinforced ${CASING_VULNERABILITY.reinforced}, downhill ${CASING_VULNERABILITY.downhill}; tubes +${TUBE_VULNERABILITY}; insert × ${INSERT_VULNERABILITY_FACTOR}`, source: COMMON_PRACTICE },
    { id: "pace-load", plain: "Your pace scales support and protection: more speed, more load.", numbers: `easy × ${PACE_LOAD_FACTOR.easy}, steady × ${PACE_LOAD_FACTOR.steady}, hard × ${PACE_LOAD_FACTOR.hard}`, source: COMMON_PRACTICE },
    { id: "tweak-bound", plain: "Today's changes together adjust your baseline, they never replace it: what goes past the bound is listed and removed.", numbers: `± ${kpaAndPsi(TWEAK_BOUND_KPA)} per wheel`, source: { kind: "our choice", text: "A day's conditions should adjust, not replace, a baseline." } },
  ],
};

export const LIMITS: RuleSection = {
  id: "limits",
  title: "Limits, band and pump reading",
  intro: "Nothing is ever advised above the printed maximum of the tyre or the rim, whichever is lower.",
  rules: [
    { id: "limit-max", plain: "Never above the printed maximum of the tyre or the rim, whichever is lower: target, band and pump reading are all held there, with a caution.", numbers: "As printed on your tyre and rim", source: { kind: "safety", text: "Manufacturers' limits." } },
    { id: "limit-floor", plain: "A floor below which rim strikes and burping become likely for your load and tyre: the target is lifted to it, the band stops at it.", numbers: `Tyre pressed in by ${FLOOR_DROP_TUBELESS * 100} % (tubeless) or ${FLOOR_DROP_TUBES * 100} % (tubes) of its height, +${FLOOR_DROP_INSERT_BONUS * 100} % with an insert; never below ${kpaAndPsi(ABSOLUTE_FLOOR_KPA)}`, source: COMMON_PRACTICE },
    { id: "band-width", plain: "The band around the target: narrower around your own baseline, wider around an estimate.", numbers: `± ${BAND_FRACTION_BASELINE * 100} % of the target with a baseline, ± ${BAND_FRACTION_ESTIMATE * 100} % for an estimate, between ${BAND_MIN_HALF_KPA} and ${BAND_MAX_HALF_KPA} kPa`, source: COMMON_PRACTICE },
    { id: "pump-temperature", plain: "Pumping somewhere warmer than the trail: pump higher, the tyre loses pressure as it cools (and the other way round).", numbers: "Gay-Lussac's law at the trail's air pressure", source: { kind: "published", text: "Gay-Lussac's law (see Physics)." } },
    { id: "pump-elevation", plain: "Riding higher than where you pump: pump lower, the gauge reads more where the air is thinner.", numbers: "ISO 2533 air pressure at both elevations; the park's midpoint unless you give the ride elevation", source: { kind: "published", text: "ISO 2533:1975." } },
    { id: "pump-limit", plain: "The pump reading stays between zero and the printed maximum.", numbers: "—", source: { kind: "safety", text: "Manufacturers' limits." } },
    { id: "report-age", plain: "A trail without a report today is unknown: it counts in the share but adds nothing, and you are told so. Older reports get a caution.", numbers: `Older than ${STALE_REPORT_HOURS} h`, source: { kind: "our choice", text: "Conditions change; say when they are not known." } },
  ],
};

export const AFTER_THE_RIDE: RuleSection = {
  id: "after-the-ride",
  title: "After the ride, and suspension",
  intro: "A ride log gives exactly one suggested change to your baseline, safety first: change one thing at a time. A change never goes past the printed maximum or below the floor.",
  rules: [
    ...FEEDBACK_RULES.map((rule, i) => ({
      id: `feedback-${rule.symptom}`,
      plain: `Priority ${i + 1}: ${rule.symptom.replace(/-/g, " ")} — ${rule.deltaKpa > 0 ? "more" : "less"} air, because ${rule.why}.`,
      numbers: `${rule.deltaKpa > 0 ? "+" : "\u2212"}${kpaAndPsi(Math.abs(rule.deltaKpa))} on that wheel; ties go to the front`,
      source: COMMON_PRACTICE,
    })),
    { id: "sag-rear", plain: "Rear sag: the shock's travel used with you sitting on the bike, as a share of its stroke.", numbers: `${SAG_TARGET_PERCENT.rear.min}–${SAG_TARGET_PERCENT.rear.max} % of the shock stroke`, source: { kind: "common practice", text: "Common practice, no published standard (some guides say 20–30 %); follow the maker's figure." } },
    { id: "sag-fork", plain: "Fork sag, the same at the front.", numbers: `${SAG_TARGET_PERCENT.fork.min}–${SAG_TARGET_PERCENT.fork.max} % of the fork travel`, source: { kind: "from memory", text: "Common practice, from memory; follow the maker's figure." } },
  ],
};

export const CAUTIONS: readonly string[] = STANDARD_CAUTIONS;
