import bcrypt from "bcryptjs";
import { afterAll, describe, expect, it, vi } from "vitest";
import type { CredentialsConfig } from "next-auth/providers/credentials";
import { proveAddress, resendProof, signUpRider, SIGN_UP_ANSWER } from "@/lib/accounts/sign-up";
import { signInMessage } from "@/lib/accounts/pure/sign-in-refusals";
import { loadActor } from "@/lib/server/auth/actor";
import { authOptions } from "@/lib/server/auth/options";
import { MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS } from "@/lib/server/auth/rate-limit";
import { endAllSessions } from "@/lib/server/auth/sessions";
import { LIMITS } from "@/lib/server/auth/throttle";
import { AppError } from "@/lib/shared/errors";
import { AuditEvent, SignInAttempt, User, sequelize } from "@/models";
import { capturedMessages, createUser, tokenMailedTo, uniqueEmail } from "../helpers";

const credentials = authOptions.providers[0] as unknown as { options: CredentialsConfig };
/** `forwardedFor` as scripts/serve.mjs hands it on: the right-most entry is the socket peer. */
const signIn = (email: string, password: string, forwardedFor = "203.0.113.7") =>
  credentials.options.authorize!({ email, password }, { headers: { "x-forwarded-for": forwardedFor } } as never);
const randomAddress = () => `192.0.2.${Math.floor(Math.random() * 250) + 1}-${Math.random().toString(36).slice(2, 8)}`;
const PASSWORD = "switchback-sunrise-9";

const proofToken = (email: string) => tokenMailedTo(email, "/account/prove");

afterAll(() => sequelize.close());

describe("rider sign-up with a proven address (ASVS v5.0.0 6.2.1, 6.2.4, 6.3.8)", () => {
  it("makes an unproven account that cannot sign in until the mailed link is opened", async () => {
    const email = uniqueEmail("signup");
    expect(await signUpRider({ name: "Nia", email, password: PASSWORD }, randomAddress())).toEqual(SIGN_UP_ANSWER);
    const row = (await User.findOne({ where: { email } }))!;
    expect(row.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(row.siteRole).toBe("rider");
    expect(row.emailVerifiedAt).toBeNull();
    await expect(signIn(email, PASSWORD)).rejects.toThrow("unproven");
    expect(await loadActor(row.id)).toBeNull();
    const token = await proofToken(email);
    await proveAddress({ token });
    expect(await signIn(email, PASSWORD)).toMatchObject({ id: row.id });
    // Single use.
    await expect(proveAddress({ token })).rejects.toThrow(/not valid any more/);
  });

  it.each([
    ["short", "abc12", "at least 8"],
    ["common", "password123", "too common"],
    ["longer than bcrypt's 72 bytes", "é".repeat(37), "at most 72 bytes"],
  ])("refuses a %s password and writes nothing", async (_label, password, message) => {
    const email = uniqueEmail("weak");
    await expect(signUpRider({ name: "Nia", email, password }, randomAddress())).rejects.toThrow(message);
    expect(await User.count({ where: { email } })).toBe(0);
  });

  it("answers a taken address exactly as a new one and mails its owner instead (finding 5; was 409 'already exists')", async () => {
    const owner = await createUser();
    const answer = await signUpRider({ name: "B", email: owner.email, password: "loam-and-clay-77" }, randomAddress());
    expect(answer).toEqual(SIGN_UP_ANSWER);
    const mail = (await capturedMessages()).filter((m) => m.to.includes(owner.email)).at(-1);
    expect(mail?.raw).toContain("already has one");
    expect((await User.findByPk(owner.id))!.passwordHash).toBe(owner.passwordHash);
  });

  it("limits sign-ups per address: one more than the hourly limit from one address is refused with 429 (ASVS 2.4.1; 48 in a row were accepted)", async () => {
    const from = randomAddress();
    for (let i = 0; i < LIMITS.signUpPerAddress.max; i++) await signUpRider({ name: "Bot", email: uniqueEmail("flood"), password: PASSWORD }, from);
    const error = await signUpRider({ name: "Bot", email: uniqueEmail("flood"), password: PASSWORD }, from).catch((e) => e);
    expect((error as AppError).status).toBe(429);
  });

  it("resending the link answers the same for any address and sends at most 3 an hour to one address", async () => {
    const email = uniqueEmail("resend");
    await signUpRider({ name: "Ola", email, password: PASSWORD }, randomAddress());
    for (let i = 0; i < 3; i++) await resendProof({ email }, randomAddress()).catch(() => undefined);
    expect(await resendProof({ email: uniqueEmail("nobody") }, randomAddress())).toEqual(await resendProof({ email: uniqueEmail("nobody") }, randomAddress()));
    const sent = (await capturedMessages()).filter((m) => m.to.includes(email));
    expect(sent.length).toBeLessThanOrEqual(3);
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

  it("an unknown address costs one password comparison, as a real one does (ASVS v5.0.0 6.3.8; was ~44 ms against ~190 ms)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    await signIn(uniqueEmail("warm-up"), "x-warm-up-x");
    const compare = vi.spyOn(bcrypt, "compare");
    await signIn(user.email, "wrong-password-1");
    const forKnown = compare.mock.calls.length;
    await signIn(uniqueEmail("nobody"), "wrong-password-1");
    expect(compare.mock.calls.length - forKnown).toBe(forKnown);
    expect(forKnown).toBe(1);
    compare.mockRestore();
  });

  it("throttles one address after repeated failures but not the same account elsewhere (ASVS 6.1.1, 6.3.1)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS; i++) {
      expect(await signIn(user.email, "not-it-at-all", "198.51.100.1")).toBeNull();
    }
    await expect(signIn(user.email, "berm-builder-2026", "198.51.100.1")).rejects.toThrow("throttled");
    expect(await signIn(user.email, "berm-builder-2026", "198.51.100.2")).toMatchObject({ id: user.id });
  });

  it("a client-written X-Forwarded-For neither dodges the throttle nor locks a victim out (finding 3, ASVS 6.1.1)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    // The attacker writes a new left-most value per try; the socket peer (right-most) stays theirs.
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS; i++) {
      await signIn(user.email, "guess-" + i, `10.9.${i}.1, 198.51.100.77`);
    }
    await expect(signIn(user.email, "berm-builder-2026", "10.9.99.1, 198.51.100.77")).rejects.toThrow("throttled");
    // Writing the victim's address in front changed nothing for the victim.
    expect(await signIn(user.email, "berm-builder-2026", "198.51.100.88")).toMatchObject({ id: user.id });
  });

  it("a disabled account can neither sign in nor act with an existing session (ASVS 7.4.2)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    expect(await loadActor(user.id, 0)).not.toBeNull();
    await user.update({ disabledAt: new Date() });
    expect(await signIn(user.email, "berm-builder-2026")).toBeNull();
    expect(await loadActor(user.id, 0)).toBeNull();
  });

  it("with PostgreSQL away the form gets our own 'briefly unavailable', never the driver's message (issue #12 finding 7, ASVS 16.5.1)", async () => {
    const down = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:55433"), { name: "SequelizeConnectionRefusedError" });
    const count = vi.spyOn(SignInAttempt, "count").mockRejectedValueOnce(down);
    const error = (await (async () => signIn(uniqueEmail("db-down"), "whatever-password"))().catch((e: unknown) => e)) as Error;
    count.mockRestore();
    expect(error.message).toBe("unavailable");
    expect(signInMessage(error.message).text).toBe("Sign-in is briefly unavailable. Try again in a moment.");
    // next-auth's own code for a wrong password, and anything unknown, never show server text.
    expect(signInMessage("CredentialsSignin").code).toBe("mismatch");
    expect(signInMessage("connect ECONNREFUSED 127.0.0.1:55433").code).toBe("unavailable");
  });

  it("records successes and failures in the audit log without the password (ASVS 16.3.1, 16.2.5)", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    await signIn(user.email, "berm-builder-2026");
    await signIn(user.email, "audit-wrong-pass");
    const events = await AuditEvent.findAll({ where: { action: ["auth.sign-in", "auth.sign-in.failed"] }, order: [["id", "DESC"]], limit: 50 });
    expect(events.some((e) => e.action === "auth.sign-in" && e.actorId === user.id)).toBe(true);
    expect(JSON.stringify(events.map((e) => e.toJSON()))).not.toMatch(/berm-builder|audit-wrong-pass/);
  });
});

describe("sessions end on the server (finding 4, ASVS v5.0.0 7.4.1)", () => {
  it("a session issued under an earlier version is refused once the version moves", async () => {
    const user = await createUser();
    const issued = (await User.findByPk(user.id))!.sessionVersion;
    expect(await loadActor(user.id, issued)).not.toBeNull();
    await endAllSessions(user.id);
    expect(await loadActor(user.id, issued)).toBeNull();
    expect(await loadActor(user.id, issued + 1)).not.toBeNull();
  });

  it("next-auth's sign-out event moves the version, so a copied cookie stops working", async () => {
    const user = await createUser();
    await authOptions.events!.signOut!({ token: { sub: user.id }, session: undefined as never });
    expect(await loadActor(user.id, 0)).toBeNull();
  });

  it("the sign-in result carries the version the JWT keeps", async () => {
    const user = await createUser({ password: "berm-builder-2026" });
    await endAllSessions(user.id);
    expect(await signIn(user.email, "berm-builder-2026")).toMatchObject({ sessionVersion: 1 });
  });
});
