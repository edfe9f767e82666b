import { afterEach, describe, expect, it, vi } from "vitest";
import { handler } from "@/lib/server/api/handler";
import { errorResponse } from "@/lib/server/api/errors";
import { logger } from "@/lib/server/logger";
import { symbols } from "pino";

vi.mock("@/lib/server/auth/actor", () => ({ getActor: async () => null }));

/** Every line the app's logger writes, read at its stream (pino's `streamSym`), parsed. */
function captureLog() {
  const lines: Record<string, unknown>[] = [];
  const stream = (logger as unknown as Record<symbol, { write: (line: string) => boolean }>)[symbols.streamSym];
  vi.spyOn(stream, "write").mockImplementation((line: string) => {
    lines.push(JSON.parse(line));
    return true;
  });
  return lines;
}

afterEach(() => vi.restoreAllMocks());

describe("a request's log lines (docs/operations.md, Logging)", () => {
  it("a route in handler() logs its failure with the proxy's request id, and answers the generic 500", async () => {
    const lines = captureLog();
    const route = handler(async () => {
      throw new Error("the trail table is on fire");
    });
    const response = await route(new Request("http://app.test/api/x", { headers: { "x-request-id": "lb-req-00000042" } }), { params: Promise.resolve({}) });
    expect(response.status).toBe(500);
    expect(await response.json()).toEqual({ error: { message: "Something went wrong on our side." } });
    const failure = lines.find((l) => l.msg === "unexpected error");
    expect(failure).toMatchObject({ level: "error", requestId: "lb-req-00000042", source: "api", err: { message: "the trail table is on fire" } });
  });

  it("a route that skips handler() passes its request to errorResponse and keeps the id", () => {
    const lines = captureLog();
    errorResponse(new Error("photo store unreachable"), new Request("http://app.test/api/photos/1", { headers: { "x-request-id": "lb-req-00000043" } }));
    expect(lines.find((l) => l.msg === "unexpected error")).toMatchObject({ requestId: "lb-req-00000043" });
  });
});
