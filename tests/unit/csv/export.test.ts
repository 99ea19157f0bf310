import { describe, expect, it } from "vitest";
import { escapeCsvCell, toCsv } from "@/lib/csv/export";

// OWASP "CSV Injection": cells starting with = + - @ tab or carriage return are prefixed with '.
describe("escapeCsvCell", () => {
  it.each([
    ["=HYPERLINK(\"http://x.example\")", '"\'=HYPERLINK(""http://x.example"")"'],
    ["+1+cmd|' /C calc'!A0", '"\'+1+cmd|\' /C calc\'!A0"'],
    ["-2+3", '"\'-2+3"'],
    ["@SUM(A1:A2)", '"\'@SUM(A1:A2)"'],
    ["\t=1", '"\'\t=1"'],
    ["\r=1", '"\'\r=1"'],
  ])("neutralises %j", (input, expected) => {
    expect(escapeCsvCell(input)).toBe(expected);
  });

  it("leaves plain text and numbers alone, quoting per RFC 4180", () => {
    expect(escapeCsvCell("Cocoa butter")).toBe('"Cocoa butter"');
    expect(escapeCsvCell('say "hi", then')).toBe('"say ""hi"", then"');
    expect(escapeCsvCell("-12.5")).toBe('"-12.5"');
    expect(escapeCsvCell(null)).toBe('""');
  });
});

describe("toCsv", () => {
  it("writes a header line and CRLF-ended rows", () => {
    const csv = toCsv([{ header: "Name", value: (r: { n: string }) => r.n }], [{ n: "a" }, { n: "=b" }]);
    expect(csv).toBe('"Name"\r\n"a"\r\n"\'=b"\r\n');
  });
});
