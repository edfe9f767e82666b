/**
 * Every rule of the pressure engine as data: id, plain words, numbers (read from settings.ts)
 * and source. Rendered by /pressure/how-it-works; docs/pressure-rules.md is the long form.
 */
import { BASIS, PHYSICS } from "./catalogue-start";
import { AFTER_THE_RIDE, LIMITS, TODAY } from "./catalogue-today";

export type { RuleEntry, RuleSection, Source } from "./catalogue-format";
export { CAUTIONS } from "./catalogue-today";

export const RULE_SECTIONS = [BASIS, TODAY, LIMITS, AFTER_THE_RIDE, PHYSICS] as const;

export const ruleIds = (): string[] => RULE_SECTIONS.flatMap((section) => section.rules.map((rule) => rule.id));
