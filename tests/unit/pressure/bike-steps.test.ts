// A bike typed in on "Today's pressure", asked in three steps: what each step holds, when the
// rider may go on, and which step a refusal reopens. (Form behaviour, no published source needed.)
import { describe, expect, it } from "vitest";
import { BIKE_STEPS, LAST_BIKE_STEP, checkStep, errorsUpToStep, firstStepWithError, stepOfField, stepSummary } from "@/lib/pressure/pure/bike-steps";
import { pressureFieldFor } from "@/lib/pressure/pure/pressure-form";
import { emptySetupDraft, parseSetupDraft, type SetupDraft } from "@/lib/setups/pure/setup-form";

const empty = () => emptySetupDraft({ pressure: "psi", mass: "kg" });
const riderDone = (): SetupDraft => ({ ...empty(), riderMass: "72", bikeMass: "15.5" });
const wheelsDone = (): SetupDraft => {
  const d = riderDone();
  return { ...d, front: { ...d.front, max: "40" }, rear: { ...d.rear, max: "40" } };
};

describe("bike steps", () => {
  it("are three, in the order a rider knows the answers: who rides, the wheels, what has worked", () => {
    expect(BIKE_STEPS.map((s) => s.id)).toEqual(["rider", "wheels", "baseline"]);
    expect(LAST_BIKE_STEP).toBe(2);
  });

  it("every field the setup check can refuse belongs to a step (none is left unshown)", () => {
    const bad: SetupDraft = {
      ...empty(),
      riderMass: "seventy",
      bikeMass: "900",
      front: { ...empty().front, width: "24", max: "", rimMax: "x" },
      rear: { ...empty().rear, width: "", max: "900" },
      baselineFront: "hot",
      baselineRear: "900",
      baselineTemperature: "-90",
      baselineElevation: "99999",
      baselineRideTemperature: "x",
      baselineRideElevation: "-5000",
    };
    const parsed = parseSetupDraft({ ...bad, name: "x" });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    const fields = Object.keys(parsed.errors);
    expect(fields.length).toBeGreaterThanOrEqual(10);
    for (const field of fields) expect(stepOfField(field), field).not.toBeNull();
  });

  it("maps the server's field paths, through the form's names, to their step", () => {
    expect(stepOfField(pressureFieldFor("riderMassKg"))).toBe(0);
    expect(stepOfField(pressureFieldFor("rear.maxKpa"))).toBe(1);
    expect(stepOfField(pressureFieldFor("front.widthMm"))).toBe(1);
    expect(stepOfField(pressureFieldFor("baseline.frontKpa"))).toBe(2);
    expect(stepOfField(pressureFieldFor("baseline.rideElevationM"))).toBe(2);
    // The day's fields sit above the steps, always shown.
    expect(stepOfField(pressureFieldFor("today.trailIds"))).toBeNull();
    expect(stepOfField(pressureFieldFor("today.airTemperatureC"))).toBeNull();
  });

  it("the first step stops only on its own fields: an empty rear maximum is judged later", () => {
    const first = checkStep(empty(), 0);
    expect(first.next).toBe(0);
    expect(Object.keys(first.errors).sort()).toEqual(["bikeMass", "riderMass"]);
    expect(first.errors.riderMass).toBe("Rider mass (with kit) is required.");
    expect(checkStep(riderDone(), 0)).toEqual({ next: 1, errors: {} });
  });

  it("the wheels step names the missing maximum, and goes on once it is typed", () => {
    const d = riderDone();
    const missingRear = checkStep({ ...d, front: { ...d.front, max: "40" } }, 1);
    expect(missingRear.next).toBe(1);
    expect(Object.keys(missingRear.errors)).toEqual(["rear.max"]);
    expect(checkStep(wheelsDone(), 1)).toEqual({ next: 2, errors: {} });
  });

  it("a mass cleared after going on sends the rider back to the first step", () => {
    const result = checkStep({ ...wheelsDone(), riderMass: "" }, 1);
    expect(result.next).toBe(0);
    expect(Object.keys(result.errors)).toEqual(["riderMass"]);
  });

  it("the last step stays the last; a blank baseline is allowed", () => {
    expect(checkStep(wheelsDone(), 2)).toEqual({ next: 2, errors: {} });
    const bad = checkStep({ ...wheelsDone(), baselineFront: "hot", baselineRear: "23" }, 2);
    expect(bad.next).toBe(2);
    expect(Object.keys(bad.errors)).toEqual(["baselineFront"]);
  });

  it("the first step with an error wins, and the day's errors open none", () => {
    expect(firstStepWithError({ "rear.max": "x", baselineFront: "y" })).toBe(1);
    expect(firstStepWithError({ baselineFront: "y", riderMass: "z" })).toBe(0);
    expect(firstStepWithError({ trails: "Choose at least one trail." })).toBeNull();
    expect(errorsUpToStep({ riderMass: "a", "front.max": "b", baselineRear: "c", trails: "d" }, 1)).toEqual({ riderMass: "a", "front.max": "b" });
  });

  it("a finished step says what it holds, in the rider's units", () => {
    expect(stepSummary(riderDone(), 0)).toBe("Rider 72 kg, bike 15.5 kg, steady pace");
    expect(stepSummary({ ...empty(), massUnit: "lb", riderMass: "160", pace: "hard" }, 0)).toBe("Rider 160 lb, bike ?, hard pace");
    expect(stepSummary(wheelsDone(), 1)).toBe("29″ × 2.4 in both ends, tubeless");
    const d = wheelsDone();
    const mixed = { ...d, rear: { ...d.rear, bsd: "584", width: "2.3", tubeless: false } };
    expect(stepSummary(mixed, 1)).toBe("29″ × 2.4 in front, 27.5″ × 2.3 in rear, tubeless and tube");
    expect(stepSummary(wheelsDone(), 2)).toBe("None: a starting estimate");
    expect(stepSummary({ ...wheelsDone(), baselineFront: "19", baselineRear: "23" }, 2)).toBe("Front 19, rear 23 psi");
  });
});
