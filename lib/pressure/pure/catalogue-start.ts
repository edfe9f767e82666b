/** Catalogue: the physics, and the basis (the rider's baseline or the starting estimate). */
import { BEAD_SEAT_DIAMETERS_MM, wheelSizeLabel } from "./schemas";
import { LAPSE_RATE_K_PER_M, SEA_LEVEL_PRESSURE_PA, SEA_LEVEL_TEMPERATURE_K } from "@/lib/pressure/pure/physics/atmosphere";
import { COMMON_PRACTICE, percent, type RuleSection } from "./catalogue-format";
import { CASING_TERM, DYNAMIC_ALLOWANCE, FRONT_STATIC_SHARE, INSERT_TERM, PACE_TERM, TARGET_DROP, TUBE_TERM } from "./settings";

export const PHYSICS: RuleSection = {
  id: "physics",
  title: "Physics and units",
  intro: "The engine works in SI units (kPa, kg, m, °C). Gauges read above the air around them; the gas laws need absolute pressure.",
  rules: [
    { id: "units-nist-811", plain: "Conversions between psi, bar and kPa, and between kg and lb.", numbers: "1 psi = 6.894 757 kPa; 1 bar = 100 kPa; 1 lb = 0.453 592 37 kg; 1 in = 25.4 mm", source: { kind: "published", text: "NIST Special Publication 811 (2008), Appendix B.8." } },
    { id: "bsd-iso-5775", plain: "Wheel size is the tyre's bead-seat diameter.", numbers: `${BEAD_SEAT_DIAMETERS_MM.map((bsd) => `${bsd} (${wheelSizeLabel(bsd)})`).join(", ")} mm`, source: { kind: "published", text: "ISO 5775 (tyre and rim designation)." } },
    { id: "atmosphere-iso-2533", plain: "Air pressure falls with height, so a tyre carried uphill reads higher on the gauge.", numbers: `p = ${SEA_LEVEL_PRESSURE_PA} Pa · (1 − ${LAPSE_RATE_K_PER_M}·H / ${SEA_LEVEL_TEMPERATURE_K})^5.2559`, source: { kind: "published", text: "ISO 2533:1975 Standard Atmosphere." } },
    { id: "gay-lussac", plain: "In a tyre of fixed volume, absolute pressure follows absolute temperature: a tyre pumped in a warm room loses pressure on a cold hill.", numbers: "p₂ = p₁ · T₂ / T₁ (absolute pressure, kelvin); 25.0 psi at 20 °C reads 23.0 psi at 5 °C", source: { kind: "published", text: "Gay-Lussac's law; the example is computed from it." } },
    { id: "contact-patch", plain: "The tyre's contact patch carries the wheel's load at the inflation pressure.", numbers: "A ≈ F / p", source: { kind: "from memory", text: "Wilson & Papadopoulos, Bicycling Science, 3rd ed. (2004); Renart & Roura-Grabulosa, Am. J. Phys. 87 (2019)." } },
  ],
};

export const BASIS: RuleSection = {
  id: "basis",
  title: "Where the band starts",
  intro: "Your own baseline when you have saved one; otherwise a starting estimate from weight and tyre size. The estimate's band is twice as wide, because it is less certain.",
  rules: [
    { id: "basis-baseline", plain: "Your baseline is the gauge pressure that felt right, and the ground it was set on. Today's changes are measured from that ground.", numbers: "As you saved it; ground defaults to dry", source: { kind: "our choice", text: "Your own experience beats any model." } },
    { id: "estimate-load", plain: "Without a baseline: the pressure at which the wheel's load presses the tyre in by a set fraction of its height. Wider and bigger wheels need less.", numbers: `Tyre drop ${TARGET_DROP * 100} % of its height; load front ${FRONT_STATIC_SHARE} + ${DYNAMIC_ALLOWANCE}, rear ${1 - FRONT_STATIC_SHARE} + ${DYNAMIC_ALLOWANCE} of rider and bike weight`, source: { kind: "from memory", text: "Contact-patch model (see Physics); 15 % drop follows F. Berto's tyre-drop studies (road tyres, used as a trend); the load split is from memory and the allowance is common practice." } },
    { id: "estimate-casing", plain: "Thinner casings need more air to hold their shape.", numbers: `light ${percent(CASING_TERM.light)}, trail ${percent(CASING_TERM.trail)}, reinforced ${percent(CASING_TERM.reinforced)}, downhill ${percent(CASING_TERM.downhill)}`, source: COMMON_PRACTICE },
    { id: "estimate-tubes", plain: "Inner tubes pinch: they need more air than tubeless.", numbers: percent(TUBE_TERM), source: COMMON_PRACTICE },
    { id: "estimate-insert", plain: "A tyre insert backs the tyre up in hard hits, so a little less air.", numbers: percent(INSERT_TERM), source: COMMON_PRACTICE },
    { id: "estimate-pace", plain: "Faster riding loads the tyres more.", numbers: `easy ${percent(PACE_TERM.easy)}, steady ${percent(PACE_TERM.steady)}, hard ${percent(PACE_TERM.hard)}`, source: COMMON_PRACTICE },
  ],
};
