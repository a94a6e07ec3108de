import { describe, expect, it } from "vitest";
import { csvField, plotFileName, toCsv } from "@/lib/plots";

// RFC 4180 §2: fields with commas, double quotes or line breaks are enclosed in double quotes, and a
// double quote inside is escaped by preceding it with another double quote; lines end in CRLF.
describe("csvField", () => {
  it("leaves plain text and numbers unquoted", () => {
    expect(csvField("Seat 1")).toBe("Seat 1");
    expect(csvField(-3.5)).toBe("-3.5");
    expect(csvField(0.1 + 0.2)).toBe("0.30000000000000004"); // full precision: nothing is lost in export
  });
  it("quotes commas, quotes, CR and LF, doubling inner quotes", () => {
    expect(csvField('12" woofer, sealed')).toBe('"12"" woofer, sealed"');
    expect(csvField("line 1\nline 2")).toBe('"line 1\nline 2"');
    expect(csvField("a\r\nb")).toBe('"a\r\nb"');
    expect(csvField('"')).toBe('""""');
  });
  it("quotes leading and trailing spaces so spreadsheets keep them", () => {
    expect(csvField(" front")).toBe('" front"');
    expect(csvField("rear ")).toBe('"rear "');
  });
  it("writes null, NaN and ±Infinity as empty fields, -0 as 0, and huge numbers exactly", () => {
    expect([null, NaN, Infinity, -Infinity].map(csvField)).toEqual(["", "", "", ""]);
    expect(csvField(-0)).toBe("0");
    expect(csvField(1.7976931348623157e308)).toBe("1.7976931348623157e+308");
  });
  it("defuses formula-like text with an apostrophe but keeps numeric-looking text", () => {
    expect(csvField("=SUM(A1:A3)")).toBe("'=SUM(A1:A3)");
    expect(csvField("@cmd")).toBe("'@cmd");
    expect(csvField("-12.5")).toBe("-12.5");
    expect(csvField("+1e3")).toBe("+1e3");
    expect(csvField("=a,b")).toBe('"\'=a,b"');
  });
  it("throws TypeError for other types", () => {
    expect(() => csvField(true as never)).toThrow(TypeError);
  });
});

describe("toCsv", () => {
  it("writes a header with units in parentheses, CRLF line ends and a trailing CRLF", () => {
    expect(toCsv({ columns: [{ label: "Frequency", unit: "Hz" }, { label: "Seat A", unit: "dB" }], rows: [[20, -3.5], [25, null]] })).toBe(
      "Frequency (Hz),Seat A (dB)\r\n20,-3.5\r\n25,\r\n",
    );
  });
  it("quotes header labels too and pads short rows", () => {
    expect(toCsv({ columns: [{ label: "Build, front" }, { label: "α" }], rows: [["x"]] })).toBe('"Build, front",α\r\nx,\r\n');
  });
  it("writes only the header for an empty table and throws for rows longer than the header", () => {
    expect(toCsv({ columns: [{ label: "x" }], rows: [] })).toBe("x\r\n");
    expect(() => toCsv({ columns: [{ label: "x" }], rows: [[1, 2]] })).toThrow(/rows\[0\] has 2 cells/);
  });
});

describe("plotFileName", () => {
  it("makes lower-case hyphenated ASCII names from titles", () => {
    expect(plotFileName("Modal response at seats — row 1", "csv")).toBe("modal-response-at-seats-row-1.csv");
    expect(plotFileName("Absorption α of Büild 2", "png")).toBe("absorption-of-build-2.png");
  });
  it("falls back to 'plot' and caps the length at 60 characters", () => {
    expect(plotFileName("—", "svg")).toBe("plot.svg");
    expect(plotFileName("a".repeat(100), "svg")).toBe(`${"a".repeat(60)}.svg`);
  });
});
