import { describe, expect, it } from "vitest";
import { csvCell, csvRecord, neutraliseFormula, toCsv } from "@/lib/shared/csv";
import { reportsCsv } from "@/lib/conditions/pure/report-csv";

// RFC 4180 §2: records end with CRLF (rule 2); fields containing line breaks, double quotes or
// commas are enclosed in double quotes (rule 6); a double quote inside is written twice (rule 7).
describe("CSV quoting (RFC 4180 §2)", () => {
  it("leaves plain fields alone", () => {
    expect(csvRecord(["aaa", "bbb", "ccc"])).toBe("aaa,bbb,ccc");
  });
  it("quotes commas, line breaks and quotes, doubling inner quotes (the RFC's own examples)", () => {
    expect(csvCell("b\r\nbb")).toBe('"b\r\nbb"');
    expect(csvCell('b"bb')).toBe('"b""bb"');
    expect(csvCell("a,b")).toBe('"a,b"');
    expect(csvCell("line\nbreak")).toBe('"line\nbreak"');
  });
  it("quotes a semicolon or a tab as well, which locales that split on them need (issue #12 finding 7; common practice, no published source)", () => {
    expect(csvCell("berm; drop")).toBe('"berm; drop"');
    expect(csvCell("a\tb")).toBe('"a\tb"');
  });
  it("ends every record, the last included, with CRLF", () => {
    expect(toCsv(["field_name", "field_name"], [["aaa", "bbb"]])).toBe("field_name,field_name\r\naaa,bbb\r\n");
  });
  it("writes null and undefined as empty fields and numbers as they are", () => {
    expect(csvRecord([null, undefined, 3, -2.5])).toBe(",,3,-2.5");
  });
});

// OWASP, "CSV Injection": cells starting with = + - @ (tab, carriage return) are run as formulas
// by spreadsheets; prefixing a single quote keeps them text.
describe("formula neutralising (OWASP CSV Injection)", () => {
  it.each(["=1+1", "+41 555", "-2+3", "@SUM(A1)", "\tx", "\rx"])("prefixes %j with a quote", (value) => {
    expect(neutraliseFormula(value)).toBe(`'${value}`);
  });
  it("leaves other text alone, including a sign inside a cell", () => {
    expect(neutraliseFormula("Closed: trees down = chainsaw crew")).toBe("Closed: trees down = chainsaw crew");
  });
  it("neutralises before quoting", () => {
    expect(csvCell('=HYPERLINK("http://x","y")')).toBe(`"'=HYPERLINK(""http://x"",""y"")"`);
  });
});

describe("the reports export", () => {
  it("one record per report, park-local times, surfaces joined", () => {
    const csv = reportsCsv(
      [
        {
          date: "2026-12-01",
          trailName: "Gnarlroot",
          difficulty: "difficult",
          status: "closed",
          reason: "=cmd|' /C calc'!A0",
          surfaces: ["wet", "muddy"],
          features: { berms: "soft" },
          note: 'Said "no", twice',
          reporterName: "Rowan Tallis",
          reportedAt: "2026-12-01T14:42:00Z",
          revision: 2,
        },
      ],
      "America/Los_Angeles",
    );
    const [header, record, end] = csv.split("\r\n");
    expect(header).toBe("date,trail,difficulty,status,reason,surfaces,berms,jumps,wood,note,reporter,inspected_at,revision");
    // 14:42 UTC is 06:42 PST (UTC−8, IANA tzdata).
    expect(record).toBe(`2026-12-01,Gnarlroot,difficult,closed,'=cmd|' /C calc'!A0,"wet; muddy",soft,,,"Said ""no"", twice",Rowan Tallis,06:42,2`);
    expect(end).toBe("");
  });
});
