import { describe, expect, it } from "vitest";
import { detectDecimalComma, detectDelimiter, detectNewline, sniffDialect } from "@/lib/analysis/dialect";

describe("dialect sniffing", () => {
  it("finds CRLF, LF and bare CR line ends", () => {
    expect(detectNewline("a,b\r\n1,2\r\n")).toBe("\r\n");
    expect(detectNewline("a,b\n1,2\n")).toBe("\n");
    expect(detectNewline("a,b\r1,2\r")).toBe("\r");
  });

  it("finds comma, semicolon and tab separators", () => {
    expect(detectDelimiter(["t,v,i", "1,2,3", "2,3,4"])).toBe(",");
    expect(detectDelimiter(["t;v;i", "1;2;3", "2;3;4"])).toBe(";");
    expect(detectDelimiter(["t\tv\ti", "1\t2\t3", "2\t3\t4"])).toBe("\t");
  });

  it("reads commas as decimal marks when semicolons or tabs split every line", () => {
    expect(detectDelimiter(["1,5;12,3;4,2", "1,6;12,2;4,2"])).toBe(";");
    expect(detectDelimiter(["1,5\t12,3", "1,6\t12,2"])).toBe("\t");
    const s = sniffDialect("Zeit (s);Spannung (V);Strom (A)\n0;16,8;0\n1;16,7;10,5\n", true);
    expect(s.dialect).toEqual({ delimiter: ";", newline: "\n", decimalComma: true });
  });

  it("finds a decimal comma inside quoted comma-separated fields", () => {
    const s = sniffDialect('t,v,i\n0,"16,8",0\n1,"16,7","10,5"\n', true);
    expect(s.dialect).toEqual({ delimiter: ",", newline: "\n", decimalComma: true });
  });

  it("keeps decimal points as points", () => {
    expect(
      detectDecimalComma([
        ["0", "16.8", "0"],
        ["1", "16.7", "10.5"],
      ]),
    ).toBe(false);
  });

  it("ignores a cut last line when the sample is not the whole log", () => {
    const s = sniffDialect("t,v,i\n0,16.8,0\n1,16.7,10\n2,16", false);
    expect(s.rows).toHaveLength(3);
  });
});
