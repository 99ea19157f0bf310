import { describe, expect, it } from "vitest";
import { evaluateRecipe } from "@/lib/formulation";
import { ALL_FAIL, COCOA_BUTTER, HAZELNUTS, LECITHIN, NIBS, SUGAR, WHOLE_MILK_POWDER, line, passTable } from "./fixtures";

// Bases (REFERENCE.md §1): EU = finished product less inclusions (Directive 2000/36/EC Annex I
// notes); Codex = dry matter of that (Codex CXS 87-1981 section 2); US = whole product (21 CFR 163).
// US chocolate liquor = 2.2 × (cocoa ingredient − its cocoa butter) (21 CFR 163.123(a)(2)).
// Codex figures divide by a dry mass such as 98.7, so they are non-terminating; they are given to
// 34 significant digits (half-even), worked as amount ÷ dry mass by long division.

describe("REFERENCE.md worked example (60 % nib, 10 % cocoa butter, 30 % sugar)", () => {
  const result = evaluateRecipe({ lines: [line(NIBS, 60), line(COCOA_BUTTER, 10), line(SUGAR, 30)] });

  it("declares 68 % cocoa solids, not 70 %", () => {
    // REFERENCE.md §2 (Directive 2000/36/EC Art. 3, from memory): butter 60 × 0.55 + 10 = 43.0;
    // dry non-fat 60 − 33 − 1.2 = 25.8; total 68.8 → "cocoa solids: 68 % minimum".
    expect(result.composition.cocoaButter).toBe("43");
    expect(result.composition.cocoaSolidsNonFat).toBe("25.8");
    expect(result.composition.totalDryCocoaSolids).toBe("68.8");
    expect(result.composition.cocoaSolidsStatement).toBe("68");
  });
});

describe("a 70 % dark: 65 nibs, 5 cocoa butter, 29.5 sugar, 0.5 lecithin", () => {
  const result = evaluateRecipe({
    lines: [line(NIBS, 65), line(COCOA_BUTTER, 5), line(SUGAR, "29.5"), line(LECITHIN, "0.5")],
  });

  it("computes every figure of the finished product", () => {
    // cocoa butter 65 × 0.55 + 5 = 35.75 + 5 = 40.75; dry non-fat 65 × 0.43 = 27.95;
    // total dry cocoa solids 40.75 + 27.95 = 68.7 → statement 68; moisture 65 × 0.02 = 1.3;
    // total fat = cocoa butter + milk fat = 40.75; other = lecithin 0.5;
    // liquor 2.2 × 65 × (100 − 55) / 100 = 2.2 × 29.25 = 64.35 (the added butter does not count).
    // Check: 40.75 + 27.95 + 29.5 + 1.3 + 0.5 = 100.
    expect(result.composition).toEqual({
      totalDryCocoaSolids: "68.7", cocoaButter: "40.75", cocoaSolidsNonFat: "27.95",
      dryMilkSolids: "0", milkFat: "0", milkSolidsNonFat: "0", totalFat: "40.75",
      sugar: "29.5", vegetableFat: "0", moisture: "1.3", other: "0.5",
      usChocolateLiquor: "64.35", inclusions: "0", cocoaSolidsStatement: "68",
    });
    expect(result.warnings).toEqual([]);
  });

  it("computes the Codex dry basis (98.7 = 100 − 1.3 moisture)", () => {
    // 40.75 / 98.7 × 100 = 41.2867…; 68.7 / 98.7 × 100 = 69.6048…; 64.35 / 98.7 × 100 = 65.1975…
    expect(result.bases.codex).toEqual({
      baseMassPercent: "98.7",
      totalDryCocoaSolids: "69.60486322188449848024316109422492",
      cocoaButter: "41.28672745694022289766970618034448",
      cocoaSolidsNonFat: "28.31813576494427558257345491388045",
      dryMilkSolids: "0", milkFat: "0", milkSolidsNonFat: "0",
      totalFat: "41.28672745694022289766970618034448",
      sugar: "29.88855116514690982776089159067882",
      vegetableFat: "0",
      moisture: "1.317122593718338399189463019250253",
      other: "0.5065856129685916919959473150962513",
      usChocolateLiquor: "65.19756838905775075987841945288754",
    });
    // No inclusions: the EU basis is the whole product (100 %), like the US basis.
    expect(result.bases.eu.baseMassPercent).toBe("100");
    expect(result.bases.eu.totalDryCocoaSolids).toBe("68.7");
    expect(result.bases.us.usChocolateLiquor).toBe("64.35");
  });

  it("meets the dark categories and no milk or white one", () => {
    // EU A.3(a): 68.7 ≥ 35, 40.75 ≥ 18, 27.95 ≥ 14; A.3(c): 40.75 ≥ 31, 27.95 ≥ 2.5.
    // US 163.123(a)(2)/(a)(3): liquor 64.35 ≥ 15 and ≥ 35, milk solids 0 < 12.
    // Codex 2.1.1–2.1.3 on the dry basis: 69.6 ≥ 35/30, 41.3 ≥ 18/31, 28.3 ≥ 14/12/2.5.
    // Milk categories fail on dry milk solids 0; white chocolate on milk solids and cocoa solids.
    expect(passTable(result)).toEqual({
      ...ALL_FAIL,
      "EU chocolate": true, "EU couverture chocolate": true,
      "US sweet chocolate": true, "US semisweet chocolate": true,
      "Codex chocolate": true, "Codex sweet chocolate": true, "Codex couverture chocolate": true,
    });
  });
});

describe("a 45 % milk: 25 nibs, 20 cocoa butter, 20 whole milk powder, 34.5 sugar, 0.5 lecithin", () => {
  const result = evaluateRecipe({
    lines: [line(NIBS, 25), line(COCOA_BUTTER, 20), line(WHOLE_MILK_POWDER, 20), line(SUGAR, "34.5"), line(LECITHIN, "0.5")],
  });

  it("computes every figure of the finished product", () => {
    // cocoa butter 25 × 0.55 + 20 = 33.75; dry non-fat 25 × 0.43 = 10.75; total 44.5 → statement 44;
    // milk fat 20 × 0.26 = 5.2; non-fat milk solids 20 × 0.72 = 14.4; dry milk solids 19.6;
    // total fat 33.75 + 5.2 = 38.95; moisture 25 × 0.02 + 20 × 0.02 = 0.9;
    // liquor 2.2 × 25 × 0.45 = 24.75. Check: 33.75 + 10.75 + 5.2 + 14.4 + 34.5 + 0.9 + 0.5 = 100.
    expect(result.composition).toEqual({
      totalDryCocoaSolids: "44.5", cocoaButter: "33.75", cocoaSolidsNonFat: "10.75",
      dryMilkSolids: "19.6", milkFat: "5.2", milkSolidsNonFat: "14.4", totalFat: "38.95",
      sugar: "34.5", vegetableFat: "0", moisture: "0.9", other: "0.5",
      usChocolateLiquor: "24.75", inclusions: "0", cocoaSolidsStatement: "44",
    });
  });

  it("computes the Codex dry basis (99.1 = 100 − 0.9)", () => {
    // 44.5 / 99.1 = 44.904…; 10.75 / 99.1 = 10.847…; 19.6 / 99.1 = 19.778…; 38.95 / 99.1 = 39.303…
    expect(result.bases.codex).toEqual({
      baseMassPercent: "99.1",
      totalDryCocoaSolids: "44.90413723511604439959636730575177",
      cocoaButter: "34.05650857719475277497477295660949",
      cocoaSolidsNonFat: "10.84762865792129162462159434914228",
      dryMilkSolids: "19.77800201816347124117053481331988",
      milkFat: "5.247225025227043390514631685166498",
      milkSolidsNonFat: "14.53077699293642785065590312815338",
      totalFat: "39.30373360242179616548940464177598",
      sugar: "34.81331987891019172552976791120081",
      vegetableFat: "0",
      moisture: "0.9081735620585267406659939455095863",
      other: "0.5045408678102926337033299697275479",
      usChocolateLiquor: "24.97477295660948536831483350151362",
    });
  });

  it("meets milk chocolate but not family milk chocolate (19.6 < 20 % milk solids)", () => {
    // EU A.4(a): 44.5 ≥ 25, 10.75 ≥ 2.5, 19.6 ≥ 14, 5.2 ≥ 3.5, fat 38.95 ≥ 25; A.4(c): 38.95 ≥ 31.
    // EU A.5 / Codex 2.1.5 family: dry milk solids 19.6 (Codex 19.78) < 20 → fail.
    // EU A.3(a) / Codex 2.1.1 chocolate: dry non-fat 10.75 (Codex 10.85) < 14 → fail;
    // Codex 2.1.2 sweet: 10.85 < 12 → fail. A.3(c) / 2.1.3 couverture: butter 33.75 ≥ 31, 10.75 ≥ 2.5 → meets.
    // US 163.130 milk: liquor 24.75 ≥ 10, milk solids 19.6 ≥ 12, milk fat 5.2 ≥ 3.39 → meets;
    // US 163.123 sweet/semisweet: milk solids 19.6 not < 12 → fail.
    // White chocolate everywhere: 10.75 % non-fat cocoa solids → fail.
    expect(passTable(result)).toEqual({
      ...ALL_FAIL,
      "EU couverture chocolate": true, "EU milk chocolate": true, "EU couverture milk chocolate": true,
      "US milk chocolate": true,
      "Codex couverture chocolate": true, "Codex milk chocolate": true, "Codex milk chocolate couverture": true,
    });
    const family = result.standards.find((s) => s.authority === "EU" && s.category === "family milk chocolate");
    const milkSolids = family?.checks.find((c) => c.quantity === "dryMilkSolids");
    // EU A.5: dry milk solids ≥ 20 %; 20 − 19.6 = 0.4 short.
    expect(milkSolids).toMatchObject({ minimum: "20", actual: "19.6", pass: false, shortBy: "0.4" });
  });
});

describe("a white: 33 cocoa butter, 26 whole milk powder, 40.5 sugar, 0.5 lecithin", () => {
  const result = evaluateRecipe({
    lines: [line(COCOA_BUTTER, 33), line(WHOLE_MILK_POWDER, 26), line(SUGAR, "40.5"), line(LECITHIN, "0.5")],
  });

  it("computes every figure of the finished product", () => {
    // cocoa butter 33, no non-fat cocoa solids; milk fat 26 × 0.26 = 6.76; non-fat 26 × 0.72 = 18.72;
    // dry milk solids 25.48; total fat 39.76; moisture 26 × 0.02 = 0.52; no cocoa ingredient → liquor 0.
    // Check: 33 + 6.76 + 18.72 + 40.5 + 0.52 + 0.5 = 100.
    expect(result.composition).toEqual({
      totalDryCocoaSolids: "33", cocoaButter: "33", cocoaSolidsNonFat: "0",
      dryMilkSolids: "25.48", milkFat: "6.76", milkSolidsNonFat: "18.72", totalFat: "39.76",
      sugar: "40.5", vegetableFat: "0", moisture: "0.52", other: "0.5",
      usChocolateLiquor: "0", inclusions: "0", cocoaSolidsStatement: "33",
    });
    // Codex dry basis 99.48: 33 / 99.48 = 33.172…; 25.48 / 99.48 = 25.613…; 6.76 / 99.48 = 6.795…
    expect(result.bases.codex).toMatchObject({
      baseMassPercent: "99.48",
      cocoaButter: "33.17249698431845597104945717732207",
      dryMilkSolids: "25.61318858061921994370727784479292",
      milkFat: "6.795335745878568556493767591475674",
      sugar: "40.71170084439083232810615199034982",
    });
  });

  it("meets white chocolate only", () => {
    // EU A.6 / Codex 2.1.8 / US 163.124: butter 33 ≥ 20, milk solids 25.48 ≥ 14, milk fat 6.76 ≥ 3.5,
    // no non-fat cocoa solids; US 163.124 sweetener 40.5 ≤ 55. Everything else needs cocoa solids.
    expect(passTable(result)).toEqual({
      ...ALL_FAIL,
      "EU white chocolate": true, "US white chocolate": true, "Codex white chocolate": true,
    });
  });
});

describe("a dark with 20 % hazelnuts: 56 nibs, 8 cocoa butter, 15.6 sugar, 0.4 lecithin, 20 hazelnuts", () => {
  const result = evaluateRecipe({
    lines: [line(NIBS, 56), line(COCOA_BUTTER, 8), line(SUGAR, "15.6"), line(LECITHIN, "0.4"), line(HAZELNUTS, 20)],
  });

  it("counts the inclusion in the product but in no standards quantity", () => {
    // cocoa butter 56 × 0.55 + 8 = 30.8 + 8 = 38.8; dry non-fat 56 × 0.43 = 24.08; total 62.88;
    // moisture 56 × 0.02 = 1.12 (the nuts' 5 % water and 60 % fat are ignored); inclusions 20;
    // liquor 2.2 × 56 × 0.45 = 55.44 on the whole product (US).
    // Check: 38.8 + 24.08 + 15.6 + 1.12 + 0.4 + 20 = 100.
    expect(result.composition).toEqual({
      totalDryCocoaSolids: "62.88", cocoaButter: "38.8", cocoaSolidsNonFat: "24.08",
      dryMilkSolids: "0", milkFat: "0", milkSolidsNonFat: "0", totalFat: "38.8",
      sugar: "15.6", vegetableFat: "0", moisture: "1.12", other: "0.4",
      usChocolateLiquor: "55.44", inclusions: "20", cocoaSolidsStatement: "78",
    });
  });

  it("computes the EU basis on the 80 % that is chocolate", () => {
    // 62.88 / 0.8 = 78.6 → statement 78; 38.8 / 0.8 = 48.5; 24.08 / 0.8 = 30.1; 15.6 / 0.8 = 19.5;
    // 1.12 / 0.8 = 1.4; 0.4 / 0.8 = 0.5; liquor 55.44 / 0.8 = 69.3.
    expect(result.bases.eu).toEqual({
      baseMassPercent: "80",
      totalDryCocoaSolids: "78.6", cocoaButter: "48.5", cocoaSolidsNonFat: "30.1",
      dryMilkSolids: "0", milkFat: "0", milkSolidsNonFat: "0", totalFat: "48.5",
      sugar: "19.5", vegetableFat: "0", moisture: "1.4", other: "0.5", usChocolateLiquor: "69.3",
    });
  });

  it("computes the Codex basis on the chocolate's dry matter (80 − 1.12 = 78.88)", () => {
    // 62.88 / 78.88 = 79.716…; 38.8 / 78.88 = 49.188…; 24.08 / 78.88 = 30.527…
    expect(result.bases.codex).toMatchObject({
      baseMassPercent: "78.88",
      totalDryCocoaSolids: "79.71602434077079107505070993914807",
      cocoaButter: "49.18864097363083164300202839756592",
      cocoaSolidsNonFat: "30.52738336713995943204868154158215",
      vegetableFat: "0",
    });
  });

  it("meets the dark categories; 20 % inclusions raise no warning (limit 40 %)", () => {
    // EU A.3(a)/(c) on the EU basis: 78.6 ≥ 35, 48.5 ≥ 18 and ≥ 31, 30.1 ≥ 14; US 163.123: 55.44 ≥ 35;
    // Codex 2.1.1–2.1.3: 79.7 ≥ 35, 49.2 ≥ 31, 30.5 ≥ 14. Directive 2000/36/EC Annex I notes: ≤ 40 %.
    expect(passTable(result)).toEqual({
      ...ALL_FAIL,
      "EU chocolate": true, "EU couverture chocolate": true,
      "US sweet chocolate": true, "US semisweet chocolate": true,
      "Codex chocolate": true, "Codex sweet chocolate": true, "Codex couverture chocolate": true,
    });
    expect(result.warnings).toEqual([]);
  });
});
