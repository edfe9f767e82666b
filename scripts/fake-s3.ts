/** Runs the local fake S3 server: `tsx scripts/fake-s3.ts` (port from S3_ENDPOINT, folder FAKE_S3_DIR, bucket S3_BUCKET). */
import { startFakeS3 } from "@/scripts/fakes/s3-server";

const endpoint = new URL(process.env.S3_ENDPOINT ?? "http://127.0.0.1:4566");
const bucket = process.env.S3_BUCKET ?? "loamcast-photos";
const directory = process.env.FAKE_S3_DIR ?? ".local/s3-dev";

startFakeS3({ port: Number(endpoint.port), directory, bucket })
  .then(() => console.log(`› Fake S3 server on ${endpoint.origin} (bucket ${bucket}, files in ${directory})`))
  .catch((error: NodeJS.ErrnoException) => {
    console.error(error.code === "EADDRINUSE" ? `✗ Port taken for the fake S3 server: ${error.message}` : error);
    process.exit(1);
  });
