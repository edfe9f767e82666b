/** Runs the local fake SMTP server: `tsx scripts/fake-smtp.ts` (ports from SMTP_URL and FAKE_SMTP_CONTROL_URL). */
import { startFakeSmtp } from "@/scripts/fakes/smtp-server";

const smtpPort = Number(new URL(process.env.SMTP_URL ?? "smtp://127.0.0.1:2525").port || 2525);
const controlPort = Number(new URL(process.env.FAKE_SMTP_CONTROL_URL ?? "http://127.0.0.1:2580").port || 2580);

startFakeSmtp({ smtpPort, controlPort })
  .then(() => console.log(`› Fake SMTP server on 127.0.0.1:${smtpPort} (messages at http://127.0.0.1:${controlPort}/messages)`))
  .catch((error: NodeJS.ErrnoException) => {
    console.error(error.code === "EADDRINUSE" ? `✗ Port taken for the fake SMTP server: ${error.message}` : error);
    process.exit(1);
  });
