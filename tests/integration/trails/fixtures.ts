import { readFileSync } from "node:fs";
import path from "node:path";
import { loadActor } from "@/lib/server/auth/actor";
import type { Actor } from "@/lib/server/auth/permissions";
import type { UploadedFile } from "@/lib/trails/save-upload";
import { addStaff, createPark, createUser } from "../helpers";

const CORPUS = path.resolve(__dirname, "../../fixtures/trails");
const DEMO = path.resolve(__dirname, "../../../data/demo-park/trails");

type ManifestEntry = { file: string; status: number; message?: string; contentType?: string; parkCenter?: { lon: number; lat: number } | null };
export const manifest = JSON.parse(readFileSync(path.join(CORPUS, "manifest.json"), "utf8")) as {
  defaultParkCenter: { lon: number; lat: number };
  entries: ManifestEntry[];
};

export const corpusFile = (file: string, contentType?: string): UploadedFile => ({ bytes: readFileSync(path.join(CORPUS, file)), filename: file, contentType });
export const demoFile = (file: string): UploadedFile => ({ bytes: readFileSync(path.join(DEMO, file)), filename: file });

/** A park where the corpus files lie (the corpus's default centre). */
export async function trailPark() {
  const park = await createPark();
  await park.update({ centerLon: manifest.defaultParkCenter.lon, centerLat: manifest.defaultParkCenter.lat });
  return park;
}

/** A new user with the given role in the park (or none), loaded as the permission module sees them. */
export async function personIn(parkId: string | null, role?: "manager" | "ranger"): Promise<Actor> {
  const user = await createUser();
  if (parkId && role) await addStaff(parkId, user.id, role);
  return (await loadActor(user.id))!;
}

/** The status of the AppError a promise rejects with (fails the test when it resolves). */
export async function statusOf(promise: Promise<unknown>): Promise<number> {
  try {
    await promise;
  } catch (error) {
    return (error as { status?: number }).status ?? 500;
  }
  throw new Error("expected a refusal, but it succeeded");
}
