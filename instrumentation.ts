/**
 * Runs once when a server process starts. Reads the environment at once, so a production server
 * with the development NEXTAUTH_SECRET (or none) refuses to start instead of serving forgeable
 * sessions (lib/server/env.ts says why).
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { env } = await import("@/lib/server/env");
  try {
    env();
  } catch (error) {
    console.error(`✗ Loamcast cannot start: ${(error as Error).message}`);
    process.exit(1);
  }
}
