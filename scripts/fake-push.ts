/** Runs the local fake push service: `tsx scripts/fake-push.ts` (port from FAKE_PUSH_URL). */
import { startFakePush } from "@/scripts/fakes/push-server";

const port = Number(new URL(process.env.FAKE_PUSH_URL ?? "http://127.0.0.1:4700").port || 4700);

startFakePush({ port })
  .then((fake) => console.log(`› Fake push service on ${fake.origin} (received pushes at ${fake.origin}/control/received)`))
  .catch((error: NodeJS.ErrnoException) => {
    console.error(error.code === "EADDRINUSE" ? `✗ Port taken for the fake push service: ${error.message}` : error);
    process.exit(1);
  });
