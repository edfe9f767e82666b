import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { decodeText } from "@/lib/trails/pure/decode-text";
import { parseGpx } from "@/lib/trails/pure/parse-gpx";
import { parseGpxWithDom } from "./reference/dom-gpx";

// The streaming reader replaced a DOM reader (xmldom + @tmcw/togeojson, kept in ./reference):
// both must read every GPX file we have alike, accepted or refused. The only files read
// differently on purpose are listed, with what changed.
const corpus = path.resolve(__dirname, "../../fixtures/trails");
const demo = path.resolve(__dirname, "../../../data/demo-park/trails");
const files = [
  ...readdirSync(corpus).filter((f) => f.endsWith(".gpx")).map((f) => path.join(corpus, f)),
  ...readdirSync(demo).filter((f) => f.endsWith(".gpx")).map((f) => path.join(demo, f)),
];
const READ_LIBERALLY = new Set(["quirk-no-version-no-namespace.gpx"]); // the DOM reader refused a root without version or namespace

type Outcome = { ok: true; trail: ReturnType<typeof parseGpx> } | { ok: false; status: number; message: string };
function outcome(read: (text: string) => ReturnType<typeof parseGpx>, text: string): Outcome {
  try {
    return { ok: true, trail: read(text) };
  } catch (error) {
    if (!(error instanceof AppError)) throw error;
    // The two XML parsers word the detail of a syntax error differently; the refusal is the same.
    const wellFormed = !error.message.startsWith("The file is not well-formed XML");
    return { ok: false, status: error.status, message: wellFormed ? error.message : error.message.replace(/\(.*\)\.$/s, "(…).") };
  }
}

function textOf(file: string): string | null {
  try {
    return decodeText(readFileSync(file));
  } catch {
    return null; // not text (the binary fixtures): refused before either reader runs
  }
}

describe("streaming GPX reader agrees with the DOM reader it replaced", () => {
  const readable = files.filter((f) => textOf(f)?.trim() && !READ_LIBERALLY.has(path.basename(f)));
  it("covers every GPX fixture and demo trail", () => {
    expect(readable.length).toBeGreaterThanOrEqual(40);
  });

  it.each(readable.map((f) => [path.basename(f), f]))("%s", (_name, file) => {
    const text = textOf(file)!;
    expect(outcome(parseGpx, text)).toEqual(outcome(parseGpxWithDom, text));
  });

  it("reads a root with neither version nor namespace, which the DOM reader refused", () => {
    const text = textOf(path.join(corpus, "quirk-no-version-no-namespace.gpx"))!;
    expect(outcome(parseGpxWithDom, text)).toMatchObject({ ok: false, status: 422 });
    const trail = parseGpx(text);
    expect(trail.warnings.join(" ")).toContain("read as GPX 1.1");
    expect(trail.segments).toEqual(parseGpxWithDom(text.replace("<gpx ", '<gpx version="1.1" ')).segments);
  });
});
