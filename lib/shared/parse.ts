import type { z } from "zod";
import { AppError } from "@/lib/shared/errors";

/** Parses with a schema; the first problem becomes an AppError(400) naming the failing field. */
export function parseInput<S extends z.ZodType>(schema: S, raw: unknown): z.infer<S> {
  const parsed = schema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  throw new AppError(400, issue?.message ?? "Invalid input.", issue?.path.join(".") || undefined);
}
