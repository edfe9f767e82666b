import { describe, expect, it } from "vitest";
import { messageIdDomain, messageIdParts, noticeMessageId } from "@/lib/notices/pure/message-id";

describe("deterministic Message-ID per notice and rider", () => {
  it("has the msg-id form <left@right> (RFC 5322 §3.6.4) and is the same on every call", () => {
    const id = noticeMessageId("n-1", "u-2", "loamcast.local");
    expect(id).toBe("<notice-n-1.u-2@loamcast.local>");
    expect(noticeMessageId("n-1", "u-2", "loamcast.local")).toBe(id);
    expect(noticeMessageId("n-1", "u-3", "loamcast.local")).not.toBe(id);
    const { prefix, suffix } = messageIdParts("n-1", "loamcast.local");
    expect(`${prefix}u-2${suffix}`).toBe(id);
  });

  it("takes its domain from the app's address and refuses anything else", () => {
    expect(messageIdDomain("https://conditions.example.test:8443/x")).toBe("conditions.example.test");
    expect(() => messageIdParts("n", "bad>domain")).toThrow();
  });
});
