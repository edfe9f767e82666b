import { describe, expect, it } from "vitest";
import { clientAddressFrom } from "@/lib/shared/client-address";

/**
 * Issue #12 finding 3 (ASVS v5.0.0 6.1.1). X-Forwarded-For semantics from RFC 7239 §5.2's
 * predecessor practice as MDN documents it ("X-Forwarded-For", security and privacy concerns):
 * each proxy appends the address it received from, so only the right-most entries written by
 * trusted proxies can be believed; the left-most is whatever the client sent.
 */
describe("clientAddressFrom", () => {
  it("with no trusted proxy takes the socket peer (the right-most entry), not the client-written left-most", () => {
    expect(clientAddressFrom("6.6.6.6, 203.0.113.9", 0)).toBe("203.0.113.9");
    expect(clientAddressFrom("203.0.113.9", 0)).toBe("203.0.113.9");
  });

  it("with one trusted proxy takes the entry that proxy appended", () => {
    expect(clientAddressFrom("6.6.6.6, 198.51.100.4, 10.0.0.2", 1)).toBe("198.51.100.4");
  });

  it("never walks left of the chain, and survives a missing header", () => {
    expect(clientAddressFrom("198.51.100.4", 3)).toBe("198.51.100.4");
    expect(clientAddressFrom(null, 0)).toBe("unknown");
    expect(clientAddressFrom(" , ", 0)).toBe("unknown");
  });
});
