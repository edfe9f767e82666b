/** Catalogue: the physics, and the basis (the rider's baseline or the starting estimate). */
import { wheelSizeText } from "@/lib/shared/units";
import { BEAD_SEAT_DIAMETERS_MM } from "./schemas";
import { LAPSE_RATE_K_PER_M, SEA_LEVEL_PRESSURE_PA, SEA_LEVEL_TEMPERATURE_K } from "@/lib/pressure/pure/physics/atmosphere";
import { COMMON_PRACTICE, percent, type RuleSection } from "./catalogue-format";
import { MAX_LEARNING_LOGS, MIN_LEARNING_LOGS } from "./settings";
import { PATCH_SPREAD } from "@/lib/pressure/pure/physics/contact-patch";
import { DYNAMIC_ALLOWANCE, FRONT_STATIC_SHARE, INSERT_FACTOR, PACE_FACTOR, SHAPE_PRESSURE_KPA, TARGET_DROP, TUBE_FACTOR } from "./settings";
import { kpaAndPsi } from "./catalogue-format";

export const PHYSICS: RuleSection = {
  id: "physics",
  title: "Physics and units",
  intro: "The engine works in SI units (kPa, kg, m, °C). Gauges read above the air around them; the gas laws need absolute pressure.",
  rules: [
    { id: "units-nist-811", plain: "Conversions between psi, bar and kPa, and between kg and lb.", numbers: "1 psi = 6.894 757 kPa; 1 bar = 100 kPa; 1 lb = 0.453 592 37 kg; 1 in = 25.4 mm", source: { kind: "published", text: "NIST Special Publication 811 (2008), Appendix B.8." } },
    { id: "bsd-iso-5775", plain: "Wheel size is the tyre's bead-seat diameter.", numbers: `${BEAD_SEAT_DIAMETERS_MM.map((bsd) => `${bsd} (${wheelSizeText(bsd)})`).join(", ")} mm`, source: { kind: "published", text: "ISO 5775 (tyre and rim designation)." } },
    { id: "atmosphere-iso-2533", plain: "Air pressure falls with height, so a tyre carried uphill reads higher on the gauge.", numbers: `p = ${SEA_LEVEL_PRESSURE_PA} Pa · (1 − ${LAPSE_RATE_K_PER_M}·H / ${SEA_LEVEL_TEMPERATURE_K})^5.2559`, source: { kind: "published", text: "ISO 2533:1975 Standard Atmosphere." } },
    { id: "gay-lussac", plain: "In a tyre of fixed volume, absolute pressure follows absolute temperature: a tyre pumped in a warm room loses pressure on a cold hill.", numbers: "p₂ = p₁ · T₂ / T₁ (absolute pressure, kelvin); 25.0 psi at 20 °C reads 23.0 psi at 5 °C", source: { kind: "published", text: "Gay-Lussac's law; the example is computed from it." } },
    { id: "contact-patch", plain: "The tyre's contact patch carries the wheel's load at the inflation pressure, and grows faster than the tyre is pressed in.", numbers: `A ≈ F / p; A = (4/3)·${PATCH_SPREAD}·√D·d^(3/2) for a tyre of outer diameter D pressed in by d`, source: { kind: "published", text: "Renart & Roura-Grabulosa, Am. J. Phys. 87:102–109 (2019), doi:10.1119/1.5086008: F ∝ d^(3/2) for small loads. The spread factor is our calibration." } },
  ],
};

export const BASIS: RuleSection = {
  id: "basis",
  title: "Where the band starts",
  intro: "Your own rides when a saved setup has two or more logs; else your baseline; else a starting estimate from weight and tyre size. The band is wider the less certain its start.",
  rules: [
    { id: "basis-rides", plain: "With two or more ride logs on a saved setup, the band starts from your own rides: rim strikes, burps and squirm say the right pressure is higher, harsh rides (and sliding on grippy ground) that it is lower, fine rides sit inside. Each ride's pressure is first brought to your baseline's ground.", numbers: `At least ${MIN_LEARNING_LOGS} rides, the newest ${MAX_LEARNING_LOGS}; the ± shrinks with the number of rides`, source: { kind: "our choice", text: "Interval censoring of your own rides (see docs/pressure-rules.md)." } },
    { id: "basis-rides-slick", plain: "Sliding on wet, muddy or loose ground tells us about that ground, not about your dry pressure: on a day at least as slick, the band stays a little under the pressure that slid (never below one that struck the rim); on grippier ground it changes nothing.", numbers: "5 % under the slide, brought to your baseline's ground; by the share of planned trails that slick", source: { kind: "common practice", text: "Lower pressure for grip on slick ground is common practice, no published source; the bound is ours (docs/pressure-rules.md)." } },
    { id: "basis-rides-disagree", plain: "When your rides contradict each other (a rim strike above a pressure that felt harsh), the band widens to span them and says so.", numbers: "± spans the disagreeing rides", source: { kind: "our choice", text: "Say how sure we are." } },
    { id: "basis-baseline", plain: "Your baseline is the gauge pressure that felt right, and the ground it was set on. Today's changes are measured from that ground.", numbers: "As you saved it; ground defaults to dry", source: { kind: "our choice", text: "Your own experience beats any model." } },
    { id: "basis-ride-conditions", plain: "A baseline checked in a warm garage and ridden on a cold hill read less on the trail: the engine works with what it read on the trail.", numbers: "Gay-Lussac (absolute pressure) and ISO 2533 between where it was checked and where it was ridden; 25.0 psi checked at 20 °C and 500 m reads 23.0 psi ridden at 5 °C", source: { kind: "published", text: "Gay-Lussac's law; ISO 2533:1975 (see Physics)." } },
    { id: "estimate-load", plain: "Without a baseline: the pressure at which braking, berms and landings press the tyre in by a set share of its height. Wider and bigger wheels need less; the reason also says how far your weight alone presses it in.", numbers: `Pressed in ${TARGET_DROP * 100} % of its height under (${FRONT_STATIC_SHARE} + ${DYNAMIC_ALLOWANCE}) × weight at the front and (${1 - FRONT_STATIC_SHARE} + ${DYNAMIC_ALLOWANCE}) × weight at the rear`, source: { kind: "common practice", text: "Footprint from Renart & Roura-Grabulosa (2019); the 40/60 split, the riding loads and the drop are common practice, calibrated against the anchor points in docs/pressure-grid.md." } },
    { id: "estimate-casing", plain: "Every tyre needs some air to hold its shape in corners and keep its bead seated, whatever the load; stiffer casings need less.", numbers: `light ${kpaAndPsi(SHAPE_PRESSURE_KPA.light)}, trail ${kpaAndPsi(SHAPE_PRESSURE_KPA.trail)}, reinforced ${kpaAndPsi(SHAPE_PRESSURE_KPA.reinforced)}, downhill ${kpaAndPsi(SHAPE_PRESSURE_KPA.downhill)}`, source: COMMON_PRACTICE },
    { id: "estimate-tubes", plain: "Inner tubes pinch: they need more air than tubeless.", numbers: `${percent(TUBE_FACTOR - 1)} of the load part`, source: COMMON_PRACTICE },
    { id: "estimate-insert", plain: "A tyre insert backs the tyre up in hard hits, so a little less air.", numbers: `${percent(INSERT_FACTOR - 1)} of the load part`, source: COMMON_PRACTICE },
    { id: "estimate-pace", plain: "Faster riding loads the tyres more. Pace counts here once; today's rules do not count it again.", numbers: `easy ${percent(PACE_FACTOR.easy - 1)}, steady ${percent(PACE_FACTOR.steady - 1)}, hard ${percent(PACE_FACTOR.hard - 1)} of the load part`, source: COMMON_PRACTICE },
  ],
};
