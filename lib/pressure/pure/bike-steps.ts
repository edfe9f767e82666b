/**
 * The bike typed in on "Today's pressure", asked in three short steps instead of one long form:
 * who rides it, its wheels, and (optionally) pressures that have worked. Each step is checked
 * with the same setup schema the server uses, so a step only lets the rider on when its own
 * fields are sound, and a refusal anywhere (client or server) reopens the step that holds it.
 */
import { wheelSizeText } from "@/lib/shared/units";
import { numberFrom, parseSetupDraft, type DraftErrors, type SetupDraft, type WheelDraft } from "@/lib/setups/pure/setup-form";

export const BIKE_STEPS = [
  { id: "rider", title: "Rider and bike" },
  { id: "wheels", title: "Wheels and tyres" },
  { id: "baseline", title: "Pressures that have worked" },
] as const;
export type BikeStep = (typeof BIKE_STEPS)[number]["id"];
export const LAST_BIKE_STEP = BIKE_STEPS.length - 1;

/** The step whose fields hold `field` (a form field name as `draftErrors` keys them), or null for the day's fields. */
export function stepOfField(field: string): number | null {
  if (["riderMass", "bikeMass", "pace", "massUnit", "pressureUnit", "name"].includes(field)) return 0;
  if (field.startsWith("front.") || field.startsWith("rear.") || field === "front" || field === "rear") return 1;
  if (field.startsWith("baseline")) return 2;
  return null;
}

/** The errors that belong to steps up to and including `step`. */
export function errorsUpToStep(errors: DraftErrors, step: number): DraftErrors {
  return Object.fromEntries(Object.entries(errors).filter(([field]) => {
    const at = stepOfField(field);
    return at !== null && at <= step;
  }));
}

/** The first step holding one of `errors`, or null when none of them is a bike field. */
export function firstStepWithError(errors: DraftErrors): number | null {
  const steps = Object.keys(errors).map(stepOfField).filter((s): s is number => s !== null);
  return steps.length ? Math.min(...steps) : null;
}

/**
 * Checks the draft as far as `step`: `next` is the step to show (one on when all is well, or the
 * first step with an error) and `errors` the errors to show there. Later steps' fields are not
 * judged yet: an empty rear maximum is no reason to stop a rider on the first step.
 */
export function checkStep(draft: SetupDraft, step: number): { next: number; errors: DraftErrors } {
  const parsed = parseSetupDraft({ ...draft, name: draft.name.trim() || "Unsaved setup" });
  const errors = parsed.ok ? {} : errorsUpToStep(parsed.errors, step);
  const first = firstStepWithError(errors);
  return first === null ? { next: Math.min(step + 1, LAST_BIKE_STEP), errors } : { next: first, errors };
}

const PACE_WORDS = { easy: "easy", steady: "steady", hard: "hard" } as const;

function wheelWords(wheel: WheelDraft): string {
  const width = wheel.width.trim() ? `${wheel.width.trim()}${wheel.widthUnit === "in" ? " in" : " mm"}` : "width not given";
  return `${wheelSizeText(Number(wheel.bsd))} × ${width}`;
}

/** One line telling what a finished step holds, shown beside its name so the rider can check it without going back. */
export function stepSummary(draft: SetupDraft, step: number): string {
  if (step === 0) {
    const mass = (text: string) => (numberFrom(text) === undefined ? "?" : `${text.trim()} ${draft.massUnit}`);
    return `Rider ${mass(draft.riderMass)}, bike ${mass(draft.bikeMass)}, ${PACE_WORDS[draft.pace]} pace`;
  }
  if (step === 1) {
    const front = wheelWords(draft.front);
    const rear = wheelWords(draft.rear);
    const air = draft.front.tubeless && draft.rear.tubeless ? "tubeless" : !draft.front.tubeless && !draft.rear.tubeless ? "tubes" : "tubeless and tube";
    return `${front === rear ? `${front} both ends` : `${front} front, ${rear} rear`}, ${air}`;
  }
  const front = draft.baselineFront.trim();
  const rear = draft.baselineRear.trim();
  return front || rear ? `Front ${front || "?"}, rear ${rear || "?"} ${draft.pressureUnit}` : "None: a starting estimate";
}
