import { describe, expect, it } from "vitest";
import { applicationServerKey, readPushAlert, sameOriginUrl } from "@/lib/notices/pure/push-alert";
import { classifyPushError } from "@/lib/notices/pure/retry-policy";
import { composeNoticePush, PUSH_BODY_MAX } from "@/lib/notices/compose";

const ORIGIN = "https://conditions.example-park.test";

describe("the push alert a service worker shows", () => {
  it("reads our payload and keeps a tap on our own origin", () => {
    const alert = readPushAlert(JSON.stringify({ title: "Fernline closed", body: "Fallen tree.", url: `${ORIGIN}/parks/fern`, tag: "notice-1" }), ORIGIN);
    expect(alert).toEqual({ title: "Fernline closed", body: "Fallen tree.", url: `${ORIGIN}/parks/fern`, tag: "notice-1" });
    expect(readPushAlert(JSON.stringify({ ...alert, url: "https://elsewhere.example.test/x" }), ORIGIN).url).toBe(`${ORIGIN}/`);
    expect(sameOriginUrl("javascript:alert(1)", ORIGIN)).toBe(`${ORIGIN}/`);
    expect(sameOriginUrl("/parks/fern", ORIGIN)).toBe(`${ORIGIN}/parks/fern`);
  });

  it("shows a plain alert for a payload it cannot read, rather than nothing", () => {
    expect(readPushAlert("not json", ORIGIN)).toMatchObject({ title: "Loamcast", url: `${ORIGIN}/` });
    expect(readPushAlert(JSON.stringify({ title: "" }), ORIGIN).title).toBe("Loamcast");
  });

  it("turns the VAPID public key into the 65 bytes of an uncompressed P-256 point (RFC 8292 §3.2, SEC 1 §2.3.3)", () => {
    const raw = Buffer.concat([Buffer.from([4]), Buffer.alloc(64, 7)]);
    const bytes = applicationServerKey(raw.toString("base64url"));
    expect(bytes.length).toBe(65);
    expect(Buffer.from(bytes).equals(raw)).toBe(true);
  });

  it("keeps the body within its room, with the closed-until time whole", () => {
    const push = composeNoticePush({
      park: { name: "Fern Gully", slug: "fern-gully", timeZone: "Europe/Zurich" },
      subject: "Fern Gully: all trails closed",
      message: "Storm damage. ".repeat(100),
      closedUntil: new Date("2030-06-14T08:00:00Z"),
      appUrl: ORIGIN,
      noticeId: "n1",
    });
    expect(push.body.length).toBeLessThanOrEqual(PUSH_BODY_MAX);
    // 14 June 2030 is a Friday; Zurich keeps summer time (UTC+2) then.
    expect(push.body).toMatch(/^Storm damage\. .*… Closed until Fri 14 Jun 2030, 10:00, park time \(Europe\/Zurich\)\.$/);
    expect(push.url).toBe(`${ORIGIN}/parks/fern-gully`);
  });
});

describe("a push service's answers (RFC 8030 §5, §7.3; RFC 8292 §4)", () => {
  const refused = (statusCode: number) => Object.assign(new Error("refused"), { statusCode });
  it("404 and 410: the subscription is gone; 429 and 5xx: try again; other 4xx: give up; no answer: try again", () => {
    expect(classifyPushError(refused(410))).toMatchObject({ permanent: true, gone: true });
    expect(classifyPushError(refused(404))).toMatchObject({ permanent: true, gone: true });
    expect(classifyPushError(refused(429))).toEqual({ permanent: false, summary: "Push 429: refused" });
    expect(classifyPushError(refused(503)).permanent).toBe(false);
    expect(classifyPushError(refused(403))).toEqual({ permanent: true, summary: "Push 403: refused" });
    expect(classifyPushError(refused(413)).permanent).toBe(true);
    expect(classifyPushError(Object.assign(new Error("could not encrypt to this browser"), { permanent: true })).permanent).toBe(true);
    expect(classifyPushError(Object.assign(new TypeError("fetch failed"), { cause: { code: "ECONNREFUSED" } }))).toEqual({ permanent: false, summary: "ECONNREFUSED: fetch failed" });
  });
});
