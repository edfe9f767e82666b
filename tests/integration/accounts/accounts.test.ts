import { afterAll, describe, expect, it } from "vitest";
import type { CredentialsConfig } from "next-auth/providers/credentials";
import { signUpRider } from "@/lib/accounts/sign-up";
import { loadActor } from "@/lib/server/auth/actor";
import { authOptions } from "@/lib/server/auth/options";
import { MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS } from "@/lib/server/auth/rate-limit";
import { AppError } from "@/lib/shared/errors";
import { User, sequelize } from "@/models";
import { createUser, uniqueEmail } from "../helpers";

const credentials = authOptions.providers[0] as unknown as { options: CredentialsConfig };
const signIn = (email: string, password: string, ip = "203.0.113.7") =>
  credentials.options.authorize!({ email, password }, { headers: { "x-forwarded-for": ip } } as never);

afterAll(() => sequelize.close());

describe("rider sign-up (ASVS v5.0.0 6.2.1, 6.2.4)", () => {
  it("creates an account with a hashed password", async () => {
    const email = uniqueEmail("signup");
    const user = await signUpRider({ name: "Nia", email, password: "switchback-sunrise-9" });
    const row = await User.findByPk(user.id);
    expect(row?.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(row?.passwordHash).not.toContain("switchback");
    expect(row?.siteRole).toBe("rider");
  });

  it.each([
    ["short", "abc12", "at least 8"],
    ["common", "password123", "too common"],
  ])("refuses a %s password and writes nothing", async (_label, password, message) => {
    const email = uniqueEmail("weak");
    await expect(signUpRider({ name: "Nia", email, password })).rejects.toThrow(message);
    expect(await User.count({ where: { email } })).toBe(0);
  });

  it("refuses a taken address with 409", async () => {
    const email = uniqueEmail("taken");
    await signUpRider({ name: "A", email, password: "loam-and-clay-77" });
    const error = await signUpRider({ name: "B", email, password: "loam-and-clay-77" }).catch((e) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).status).toBe(409);
  });

  it("refuses unknown fields (no mass assignment, ASVS 15.3.3)", async () => {
    await expect(signUpRider({ name: "A", email: uniqueEmail(), password: "loam-and-clay-77", siteRole: "admin" })).rejects.toThrow();
  });
});

describe("sign-in", () => {
  it("accepts the right password and refuses a wrong one or an unknown e-mail", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    expect(await signIn(user.email, "berm-builder-2026")).toMatchObject({ id: user.id });
    expect(await signIn(user.email, "wrong-password-1")).toBeNull();
    expect(await signIn(uniqueEmail("nobody"), "berm-builder-2026")).toBeNull();
  });

  it("throttles one address after repeated failures but not the same account elsewhere (ASVS 6.1.1, 6.3.1)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS; i++) {
      expect(await signIn(user.email, "not-it-at-all", "198.51.100.1")).toBeNull();
    }
    await expect(signIn(user.email, "berm-builder-2026", "198.51.100.1")).rejects.toThrow(/Too many failed attempts/);
    // The real rider, from their own address, is not locked out.
    expect(await signIn(user.email, "berm-builder-2026", "198.51.100.2")).toMatchObject({ id: user.id });
  });

  it("a disabled account can neither sign in nor act with an existing session (ASVS 7.4.2)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    expect(await loadActor(user.id)).not.toBeNull();
    await user.update({ disabledAt: new Date() });
    expect(await signIn(user.email, "berm-builder-2026")).toBeNull();
    expect(await loadActor(user.id)).toBeNull();
  });
});
