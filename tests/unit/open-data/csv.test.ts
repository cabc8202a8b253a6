import { describe, expect, it } from "vitest";
import { csvCell, escapeCsvField, guardFormula, toCsv } from "@/lib/open-data/csv";

describe("CSV escaping (RFC 4180 §2)", () => {
  it("leaves plain fields alone", () => {
    expect(escapeCsvField("XT60")).toBe("XT60");
  });
  it("quotes fields with commas, quotes, CR or LF and doubles inner quotes (RFC 4180 §2.6, §2.7)", () => {
    expect(escapeCsvField("a,b")).toBe('"a,b"');
    expect(escapeCsvField('say "hi"')).toBe('"say ""hi"""');
    expect(escapeCsvField("line\nbreak")).toBe('"line\nbreak"');
    expect(escapeCsvField("cr\rhere")).toBe('"cr\rhere"');
  });
  it("ends every record with CRLF, header first (RFC 4180 §2.1, §2.3)", () => {
    const csv = toCsv(
      [{ name: "id", type: "integer", description: "", value: (r: { id: number }) => r.id }],
      [{ id: 1 }, { id: 2 }],
    );
    expect(csv).toBe("id\r\n1\r\n2\r\n");
  });
  it("writes missing values as empty fields and numbers without separators", () => {
    expect(csvCell(null)).toBe("");
    expect(csvCell(undefined)).toBe("");
    expect(csvCell(Number.NaN)).toBe("");
    expect(csvCell(12345.5)).toBe("12345.5");
  });
  it("starts with the header row: no comment lines, which RFC 4180 does not have", () => {
    const csv = toCsv([{ name: "id", type: "integer", description: "", value: (r: { id: number }) => r.id }], []);
    expect(csv).toBe("id\r\n");
  });
  it("writes each number rounded to its field's digits (no float noise)", () => {
    const fields = [
      { name: "v", type: "number" as const, description: "", digits: 3, value: (r: { v: number }) => r.v },
      { name: "c", type: "number" as const, description: "", digits: 0, value: (r: { v: number }) => r.v * 10 },
    ];
    expect(toCsv(fields, [{ v: 89.32431030273438 }, { v: -0.00001 }])).toBe("v,c\r\n89.324,893\r\n0,0\r\n");
  });
});

describe("formula-injection guard (OWASP CSV Injection guidance)", () => {
  it.each(["=1+1", "+41 55", "-2+3", "@SUM(A1)", "\tcmd", "\rcmd"])("prefixes a single quote to %j", (text) => {
    expect(guardFormula(text)).toBe(`'${text}`);
  });
  it("leaves ordinary text alone", () => {
    expect(guardFormula("Bench load, 30 A")).toBe("Bench load, 30 A");
  });
  it("guards only free-text columns, then escapes the result", () => {
    expect(csvCell('=HYPERLINK("x")', true)).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvCell("-5", false)).toBe("-5");
    const csv = toCsv(
      [{ name: "notes", type: "string", description: "", freeText: true, value: (r: { n: string }) => r.n }],
      [{ n: "@evil" }],
    );
    expect(csv).toBe("notes\r\n'@evil\r\n");
  });
});
