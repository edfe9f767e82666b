import type { Caller } from "./api-callers";

/** The objects hostile requests aim at (made in the spec's beforeAll). */
export type Targets = { trailId: string; trailLockVersion: number; hazardId: string; hazardLockVersion: number; setupId: string; demoTrailId: string };

type FilePart = { name: string; mimeType: string; buffer: Buffer };
export type Multipart = Record<string, string | FilePart> | FormData;

/**
 * One hostile request and the refusal it must get: its status, the field named (when one is),
 * always the JSON error shape, never a 500, and nothing written (the spec compares API listings
 * before and after).
 */
export type HostileCase = {
  name: string;
  as: Caller;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  path: (t: Targets) => string;
  /** Sent as application/json. */
  json?: (t: Targets) => unknown;
  /** Sent byte for byte with this content type. */
  raw?: { body: string | Buffer; type: string };
  multipart?: (t: Targets) => Multipart | Promise<Multipart>;
  expect: number;
  field?: string;
  /** For a request that is answered (not refused): what must hold of the answer. */
  check?: (body: any) => void; // eslint-disable-line @typescript-eslint/no-explicit-any
};
