import { afterEach, describe, expect, it, vi } from "vitest";

/** Issue #12 finding 7 (ASVS v5.0.0 13.3.1 — secrets not left at defaults): production refuses the development secret. */
const saved = { ...process.env };
afterEach(() => {
  process.env = { ...saved };
  vi.resetModules();
});

async function freshEnv(vars: Record<string, string | undefined>) {
  for (const [k, v] of Object.entries(vars)) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
  vi.resetModules();
  return (await import("@/lib/server/env")).env;
}

describe("env()", () => {
  it.each([
    ["unset", undefined],
    ["empty", ""],
  ])("refuses production with NEXTAUTH_SECRET %s", async (_label, value) => {
    const env = await freshEnv({ NODE_ENV: "production", NEXTAUTH_SECRET: value });
    expect(() => env()).toThrow(/NEXTAUTH_SECRET/);
  });

  it("refuses production with the development secret", async () => {
    const env = await freshEnv({ NODE_ENV: "production", NEXTAUTH_SECRET: "dev-only-secret-change-me-0123456789" });
    expect(() => env()).toThrow(/NEXTAUTH_SECRET/);
  });

  it("accepts production with a secret of its own, and development with none", async () => {
    expect((await freshEnv({ NODE_ENV: "production", NEXTAUTH_SECRET: "a-real-secret-of-32-characters-xx" }))().NODE_ENV).toBe("production");
    expect((await freshEnv({ NODE_ENV: "development", NEXTAUTH_SECRET: undefined }))().NEXTAUTH_SECRET).toMatch(/dev-only/);
  });

  it("reads TRUSTED_PROXY_HOPS, 0 by default", async () => {
    expect((await freshEnv({ TRUSTED_PROXY_HOPS: undefined }))().TRUSTED_PROXY_HOPS).toBe(0);
    expect((await freshEnv({ TRUSTED_PROXY_HOPS: "2" }))().TRUSTED_PROXY_HOPS).toBe(2);
  });
});
