import { defineConfig, devices } from "@playwright/test";

const port = Number(process.env.PORT ?? 3100);
// A second app instance on the same database and secrets (tests/e2e/two-instances.spec.ts).
// 500 above the first keeps it clear of other clones' ports, which differ by LOAMCAST_PORT_OFFSET.
const secondPort = Number(process.env.SECOND_PORT ?? port + 500);
process.env.SECOND_APP_URL = `http://localhost:${secondPort}`;
const chromium = {
  executablePath: "/usr/bin/chromium",
  args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
};

export default defineConfig({
  testDir: "tests/e2e",
  outputDir: ".local/test-results/e2e-artifacts",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  reporter: [["list"], ["json", { outputFile: ".local/test-results/e2e.json" }]],
  use: {
    baseURL: `http://localhost:${port}`,
    launchOptions: chromium,
    trace: "off",
    screenshot: "only-on-failure",
  },
  projects: [
    { name: "phone", use: { ...devices["Pixel 7"], launchOptions: chromium } },
    { name: "desktop", use: { viewport: { width: 1280, height: 860 }, launchOptions: chromium }, testMatch: /.*\.desktop\.spec\.ts/ },
  ],
  webServer: [
    {
      // scripts/serve.mjs is `next start` plus the socket address in X-Forwarded-For (see the file).
      command: `node scripts/serve.mjs ${port}`,
      url: `http://localhost:${port}/api/health`,
      reuseExistingServer: false,
      timeout: 120_000,
      stdout: "pipe",
      stderr: "pipe",
    },
    {
      // Same build, same environment (DATABASE_URL, NEXTAUTH_SECRET, NEXT_SERVER_ACTIONS_ENCRYPTION_KEY…).
      command: `node scripts/serve.mjs ${secondPort}`,
      url: `http://localhost:${secondPort}/api/health`,
      reuseExistingServer: false,
      timeout: 120_000,
      stdout: "ignore",
      stderr: "pipe",
    },
  ],
});
