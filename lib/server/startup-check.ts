import "server-only";
import { env } from "@/lib/server/env";

/**
 * Reads the environment as the server starts, so a production server with the development
 * NEXTAUTH_SECRET (or none) refuses to start instead of serving forgeable sessions.
 */
try {
  env();
} catch (error) {
  console.error(`✗ Loamcast cannot start: ${(error as Error).message}`);
  process.exit(1);
}
