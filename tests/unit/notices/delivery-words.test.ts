import { describe, expect, it } from "vitest";
import { deliveryLine, deliveryWord, waitingCount } from "@/lib/notices/pure/delivery-words";

// Common practice, no published source: three outcomes staff act on, and the park's clock for a retry.
describe("deliveries in plain words", () => {
  it("names each state by what it means for the rider", () => {
    expect(deliveryWord("queued", null, "UTC")).toBe("waiting");
    expect(deliveryWord("sending", null, "UTC")).toBe("waiting");
    expect(deliveryWord("sent", null, "UTC")).toBe("delivered");
    expect(deliveryWord("failed", null, "UTC")).toBe("couldn't deliver");
    // 15:42 UTC is 07:42 in Los Angeles in December (UTC−8, IANA tz database).
    expect(deliveryWord("retrying", new Date("2026-12-02T15:42:00Z"), "America/Los_Angeles")).toBe("trying again at 07:42");
  });

  it("sums the counts into one line without zeros", () => {
    const counts = { queued: 1, sending: 0, retrying: 1, sent: 8, failed: 1 };
    expect(waitingCount(counts)).toBe(2);
    expect(deliveryLine(counts)).toBe("8 delivered · 2 waiting · 1 couldn't deliver");
    expect(deliveryLine({ queued: 0, sending: 0, retrying: 0, sent: 3, failed: 0 })).toBe("3 delivered");
    expect(deliveryLine({ queued: 0, sending: 0, retrying: 0, sent: 0, failed: 0 })).toBe("nothing to deliver");
  });
});
