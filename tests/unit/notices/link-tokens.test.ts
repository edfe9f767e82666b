import { describe, expect, it } from "vitest";
import { signToken } from "@/lib/server/auth/tokens";
import { confirmToken, readConfirmToken, readUnsubscribeToken, subscriptionLinks, unsubscribeToken } from "@/lib/notices/link-tokens";

describe("signed subscription links", () => {
  it("round-trip their payload", () => {
    expect(readUnsubscribeToken(unsubscribeToken("u1", "p1"))).toMatchObject({ purpose: "unsubscribe", userId: "u1", parkId: "p1" });
    expect(readConfirmToken(confirmToken("s1", "a@example.test"))).toMatchObject({ subscriptionId: "s1", email: "a@example.test" });
  });

  it("are not interchangeable between purposes", () => {
    expect(readUnsubscribeToken(confirmToken("s1", "a@example.test"))).toBeNull();
    expect(readConfirmToken(unsubscribeToken("u1", "p1"))).toBeNull();
  });

  it("refuse expired and altered tokens", () => {
    expect(readUnsubscribeToken(signToken({ purpose: "unsubscribe", userId: "u1", parkId: "p1" }, -1))).toBeNull();
    const token = unsubscribeToken("u1", "p1");
    expect(readUnsubscribeToken(`${token}x`)).toBeNull();
  });

  it("point at the confirm API, the unsubscribe page and the one-click API", () => {
    const links = subscriptionLinks("https://conditions.example.test");
    expect(links.confirm("a.b")).toBe("https://conditions.example.test/api/subscriptions/confirm?token=a.b");
    expect(links.unsubscribePage("a.b")).toBe("https://conditions.example.test/unsubscribe?token=a.b");
    expect(links.oneClick("a.b")).toBe("https://conditions.example.test/api/unsubscribe?token=a.b");
  });
});
