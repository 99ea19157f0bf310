import { describe, expect, it } from "vitest";
import { checkStandards, evaluateRecipe, type StandardCheck } from "@/lib/formulation";

type Kind = "min" | "max" | "below";
type Row = readonly [authority: "EU" | "US" | "Codex", category: string, quantity: string, kind: Kind, limit: string, basis: "eu" | "codex" | "us", clause: string];

// Every limit of every category, written out here (not read from the engine) so the test can fail.
// kind: "min" ≥ limit, "max" ≤ limit, "below" < limit. Status from REFERENCE.md §2 beside each.
const EU = "Directive 2000/36/EC";
const LIMITS: readonly Row[] = [
  // EU Directive 2000/36/EC Annex I A.3(a) (secondary): chocolate ≥ 35 / 18 / 14
  ["EU", "chocolate", "totalDryCocoaSolids", "min", "35", "eu", `${EU} Annex I A.3(a)`],
  ["EU", "chocolate", "cocoaButter", "min", "18", "eu", `${EU} Annex I A.3(a)`],
  ["EU", "chocolate", "cocoaSolidsNonFat", "min", "14", "eu", `${EU} Annex I A.3(a)`],
  // EU Art. 2(1) (secondary): vegetable fats other than cocoa butter ≤ 5 %, in every EU category
  ["EU", "chocolate", "vegetableFat", "max", "5", "eu", `${EU} Art. 2(1)`],
  // EU Annex I A.3(c) (secondary): couverture chocolate ≥ 35 / 31 / 2.5
  ["EU", "couverture chocolate", "totalDryCocoaSolids", "min", "35", "eu", `${EU} Annex I A.3(c)`],
  ["EU", "couverture chocolate", "cocoaButter", "min", "31", "eu", `${EU} Annex I A.3(c)`],
  ["EU", "couverture chocolate", "cocoaSolidsNonFat", "min", "2.5", "eu", `${EU} Annex I A.3(c)`],
  ["EU", "couverture chocolate", "vegetableFat", "max", "5", "eu", `${EU} Art. 2(1)`],
  // EU Annex I A.4(a) (secondary): milk chocolate ≥ 25 / 2.5 / 14 milk solids / 3.5 milk fat / 25 total fat
  ["EU", "milk chocolate", "totalDryCocoaSolids", "min", "25", "eu", `${EU} Annex I A.4(a)`],
  ["EU", "milk chocolate", "cocoaSolidsNonFat", "min", "2.5", "eu", `${EU} Annex I A.4(a)`],
  ["EU", "milk chocolate", "dryMilkSolids", "min", "14", "eu", `${EU} Annex I A.4(a)`],
  ["EU", "milk chocolate", "milkFat", "min", "3.5", "eu", `${EU} Annex I A.4(a)`],
  ["EU", "milk chocolate", "totalFat", "min", "25", "eu", `${EU} Annex I A.4(a)`],
  ["EU", "milk chocolate", "vegetableFat", "max", "5", "eu", `${EU} Art. 2(1)`],
  // EU Annex I A.4(c) (from memory, same as Codex 2.1.6): couverture milk chocolate, total fat ≥ 31
  ["EU", "couverture milk chocolate", "totalDryCocoaSolids", "min", "25", "eu", `${EU} Annex I A.4(c)`],
  ["EU", "couverture milk chocolate", "cocoaSolidsNonFat", "min", "2.5", "eu", `${EU} Annex I A.4(c)`],
  ["EU", "couverture milk chocolate", "dryMilkSolids", "min", "14", "eu", `${EU} Annex I A.4(c)`],
  ["EU", "couverture milk chocolate", "milkFat", "min", "3.5", "eu", `${EU} Annex I A.4(c)`],
  ["EU", "couverture milk chocolate", "totalFat", "min", "31", "eu", `${EU} Annex I A.4(c)`],
  ["EU", "couverture milk chocolate", "vegetableFat", "max", "5", "eu", `${EU} Art. 2(1)`],
  // EU Annex I A.5 (primary): family milk chocolate ≥ 20 / 2.5 / 20 / 5 / 25
  ["EU", "family milk chocolate", "totalDryCocoaSolids", "min", "20", "eu", `${EU} Annex I A.5`],
  ["EU", "family milk chocolate", "cocoaSolidsNonFat", "min", "2.5", "eu", `${EU} Annex I A.5`],
  ["EU", "family milk chocolate", "dryMilkSolids", "min", "20", "eu", `${EU} Annex I A.5`],
  ["EU", "family milk chocolate", "milkFat", "min", "5", "eu", `${EU} Annex I A.5`],
  ["EU", "family milk chocolate", "totalFat", "min", "25", "eu", `${EU} Annex I A.5`],
  ["EU", "family milk chocolate", "vegetableFat", "max", "5", "eu", `${EU} Art. 2(1)`],
  // EU Annex I A.6 (from memory, same as US/Codex): white chocolate ≥ 20 butter / 14 / 3.5;
  // no non-fat cocoa solids (definition: cocoa butter, milk and sugar; from memory)
  ["EU", "white chocolate", "cocoaButter", "min", "20", "eu", `${EU} Annex I A.6`],
  ["EU", "white chocolate", "dryMilkSolids", "min", "14", "eu", `${EU} Annex I A.6`],
  ["EU", "white chocolate", "milkFat", "min", "3.5", "eu", `${EU} Annex I A.6`],
  ["EU", "white chocolate", "cocoaSolidsNonFat", "max", "0", "eu", `${EU} Annex I A.6`],
  ["EU", "white chocolate", "vegetableFat", "max", "5", "eu", `${EU} Art. 2(1)`],
  // 21 CFR 163.123(a)(2) (primary): sweet chocolate, liquor ≥ 15, milk solids < 12 (strict)
  ["US", "sweet chocolate", "usChocolateLiquor", "min", "15", "us", "21 CFR 163.123(a)(2)"],
  ["US", "sweet chocolate", "dryMilkSolids", "below", "12", "us", "21 CFR 163.123(a)(2)"],
  // 21 CFR 163: no fat but cacao fat and milk fat, else a coating, 163.150–163.155 (from memory)
  ["US", "sweet chocolate", "vegetableFat", "max", "0", "us", "21 CFR 163.123–163.130"],
  // 21 CFR 163.123(a)(3) (primary): semisweet / bittersweet, liquor ≥ 35, milk solids < 12
  ["US", "semisweet chocolate", "usChocolateLiquor", "min", "35", "us", "21 CFR 163.123(a)(3)"],
  ["US", "semisweet chocolate", "dryMilkSolids", "below", "12", "us", "21 CFR 163.123(a)(3)"],
  ["US", "semisweet chocolate", "vegetableFat", "max", "0", "us", "21 CFR 163.123–163.130"],
  // 21 CFR 163.130 (primary): milk chocolate, liquor ≥ 10, milk solids ≥ 12, milk fat ≥ 3.39
  ["US", "milk chocolate", "usChocolateLiquor", "min", "10", "us", "21 CFR 163.130"],
  ["US", "milk chocolate", "dryMilkSolids", "min", "12", "us", "21 CFR 163.130"],
  ["US", "milk chocolate", "milkFat", "min", "3.39", "us", "21 CFR 163.130"],
  ["US", "milk chocolate", "vegetableFat", "max", "0", "us", "21 CFR 163.123–163.130"],
  // 21 CFR 163.124 (primary): white chocolate, cacao fat ≥ 20, milk solids ≥ 14, milk fat ≥ 3.5,
  // nutritive carbohydrate sweetener ≤ 55; no non-fat cocoa solids (definition, from memory)
  ["US", "white chocolate", "cocoaButter", "min", "20", "us", "21 CFR 163.124"],
  ["US", "white chocolate", "dryMilkSolids", "min", "14", "us", "21 CFR 163.124"],
  ["US", "white chocolate", "milkFat", "min", "3.5", "us", "21 CFR 163.124"],
  ["US", "white chocolate", "sugar", "max", "55", "us", "21 CFR 163.124"],
  ["US", "white chocolate", "cocoaSolidsNonFat", "max", "0", "us", "21 CFR 163.124"],
  ["US", "white chocolate", "vegetableFat", "max", "0", "us", "21 CFR 163.123–163.130"],
  // Codex CXS 87-1981 2.1.1 (primary), dry matter basis: chocolate ≥ 35 / 18 / 14
  ["Codex", "chocolate", "totalDryCocoaSolids", "min", "35", "codex", "Codex CXS 87-1981 section 2.1.1"],
  ["Codex", "chocolate", "cocoaButter", "min", "18", "codex", "Codex CXS 87-1981 section 2.1.1"],
  ["Codex", "chocolate", "cocoaSolidsNonFat", "min", "14", "codex", "Codex CXS 87-1981 section 2.1.1"],
  // Codex section 2 (from memory): vegetable fats ≤ 5 % of the product less other foodstuffs (EU basis)
  ["Codex", "chocolate", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
  // Codex 2.1.2 (secondary): sweet chocolate ≥ 30 / 18 / 12
  ["Codex", "sweet chocolate", "totalDryCocoaSolids", "min", "30", "codex", "Codex CXS 87-1981 section 2.1.2"],
  ["Codex", "sweet chocolate", "cocoaButter", "min", "18", "codex", "Codex CXS 87-1981 section 2.1.2"],
  ["Codex", "sweet chocolate", "cocoaSolidsNonFat", "min", "12", "codex", "Codex CXS 87-1981 section 2.1.2"],
  ["Codex", "sweet chocolate", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
  // Codex 2.1.3 (secondary): couverture chocolate ≥ 35 / 31 / 2.5
  ["Codex", "couverture chocolate", "totalDryCocoaSolids", "min", "35", "codex", "Codex CXS 87-1981 section 2.1.3"],
  ["Codex", "couverture chocolate", "cocoaButter", "min", "31", "codex", "Codex CXS 87-1981 section 2.1.3"],
  ["Codex", "couverture chocolate", "cocoaSolidsNonFat", "min", "2.5", "codex", "Codex CXS 87-1981 section 2.1.3"],
  ["Codex", "couverture chocolate", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
  // Codex 2.1.4 (from memory): milk chocolate ≥ 25 / 2.5; milk solids 12–14 and milk fat 2.5–3.5
  // left to each country: default the top of the range, 14 and 3.5 (issue 3)
  ["Codex", "milk chocolate", "totalDryCocoaSolids", "min", "25", "codex", "Codex CXS 87-1981 section 2.1.4"],
  ["Codex", "milk chocolate", "cocoaSolidsNonFat", "min", "2.5", "codex", "Codex CXS 87-1981 section 2.1.4"],
  ["Codex", "milk chocolate", "dryMilkSolids", "min", "14", "codex", "Codex CXS 87-1981 section 2.1.4"],
  ["Codex", "milk chocolate", "milkFat", "min", "3.5", "codex", "Codex CXS 87-1981 section 2.1.4"],
  ["Codex", "milk chocolate", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
  // Codex 2.1.5 (secondary): family milk chocolate ≥ 20 / 2.5 / 20 / 5
  ["Codex", "family milk chocolate", "totalDryCocoaSolids", "min", "20", "codex", "Codex CXS 87-1981 section 2.1.5"],
  ["Codex", "family milk chocolate", "cocoaSolidsNonFat", "min", "2.5", "codex", "Codex CXS 87-1981 section 2.1.5"],
  ["Codex", "family milk chocolate", "dryMilkSolids", "min", "20", "codex", "Codex CXS 87-1981 section 2.1.5"],
  ["Codex", "family milk chocolate", "milkFat", "min", "5", "codex", "Codex CXS 87-1981 section 2.1.5"],
  ["Codex", "family milk chocolate", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
  // Codex 2.1.6 (secondary): milk chocolate couverture ≥ 25 / 2.5 / 14 / 3.5 / total fat 31
  ["Codex", "milk chocolate couverture", "totalDryCocoaSolids", "min", "25", "codex", "Codex CXS 87-1981 section 2.1.6"],
  ["Codex", "milk chocolate couverture", "cocoaSolidsNonFat", "min", "2.5", "codex", "Codex CXS 87-1981 section 2.1.6"],
  ["Codex", "milk chocolate couverture", "dryMilkSolids", "min", "14", "codex", "Codex CXS 87-1981 section 2.1.6"],
  ["Codex", "milk chocolate couverture", "milkFat", "min", "3.5", "codex", "Codex CXS 87-1981 section 2.1.6"],
  ["Codex", "milk chocolate couverture", "totalFat", "min", "31", "codex", "Codex CXS 87-1981 section 2.1.6"],
  ["Codex", "milk chocolate couverture", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
  // Codex 2.1.8 (from memory): white chocolate ≥ 20 butter / 14 milk solids / milk fat 2.5–3.5
  // (default 3.5); no non-fat cocoa solids (definition, from memory)
  ["Codex", "white chocolate", "cocoaButter", "min", "20", "codex", "Codex CXS 87-1981 section 2.1.8"],
  ["Codex", "white chocolate", "dryMilkSolids", "min", "14", "codex", "Codex CXS 87-1981 section 2.1.8"],
  ["Codex", "white chocolate", "milkFat", "min", "3.5", "codex", "Codex CXS 87-1981 section 2.1.8"],
  ["Codex", "white chocolate", "cocoaSolidsNonFat", "max", "0", "codex", "Codex CXS 87-1981 section 2.1.8"],
  ["Codex", "white chocolate", "vegetableFat", "max", "5", "eu", "Codex CXS 87-1981 section 2"],
];

/** The one check of a category that tests `quantity`, with `value` as its only non-zero figure. */
function checkAt(row: Row, value: string): StandardCheck | undefined {
  const [authority, category, quantity, , , basis] = row;
  const { standards } = checkStandards({ [basis]: { [quantity]: value } }, { authorities: [authority] });
  return standards.find((s) => s.category === category)?.checks.find((c) => c.quantity === quantity);
}

/** limit ± 0.001, exactly, by string arithmetic on thousandths. */
function step(limit: string, thousandths: number): string {
  const value = Math.round(Number(limit) * 1000) + thousandths;
  return `${value < 0 ? "-" : ""}${Math.floor(Math.abs(value) / 1000)}.${String(Math.abs(value) % 1000).padStart(3, "0")}`;
}

describe("each standards limit at, just under and just over its value", () => {
  it.each(LIMITS)("%s %s: %s %s %s", (...row) => {
    const [, , , kind, limit, basis, clause] = row;
    const at = checkAt(row, limit);
    expect(at, "the engine has this limit").toBeDefined();
    expect(at?.clause).toBe(clause);
    expect(at?.basis).toBe(basis);
    expect(at?.[kind === "min" ? "minimum" : "maximum"]).toBe(limit);
    expect(at?.exclusiveMaximum === true).toBe(kind === "below");
    // At the limit: a minimum and an inclusive maximum are met; a "less than" is not.
    expect(at?.pass).toBe(kind !== "below");
    // 0.001 over: only a minimum is met.
    expect(checkAt(row, step(limit, 1))?.pass).toBe(kind === "min");
    // 0.001 under (not below a zero maximum, which has no "under"): only maximums are met.
    if (limit !== "0") expect(checkAt(row, step(limit, -1))?.pass).toBe(kind !== "min");
  });

  it("has no limit the table above does not list", () => {
    const { standards } = checkStandards({});
    const listed = new Set(LIMITS.map(([a, c, q]) => `${a}|${c}|${q}`));
    const engine = standards.flatMap((s) => s.checks.map((c) => `${s.authority}|${s.category}|${c.quantity}`));
    expect(engine.length).toBe(LIMITS.length);
    expect(engine.filter((key) => !listed.has(key))).toEqual([]);
  });
});

describe("Codex settings for milk minimums (Codex CXS 87-1981 2.1.4 and 2.1.8, from memory)", () => {
  const milkSolids = (figure: string, codex?: Record<string, string>) =>
    checkStandards({ codex: { dryMilkSolids: figure } }, { authorities: ["Codex"], codex })
      .standards.find((s) => s.category === "milk chocolate")
      ?.checks.find((c) => c.quantity === "dryMilkSolids");

  it("uses the chosen minimum within the range", () => {
    // 13 % milk solids: short of the default 14 %, enough for a country choosing 12 % (2.1.4).
    expect(milkSolids("13")?.pass).toBe(false);
    expect(milkSolids("13", { milkChocolateMilkSolidsMin: "12" })).toMatchObject({ minimum: "12", pass: true });
    expect(milkSolids("11.999", { milkChocolateMilkSolidsMin: "12" })?.pass).toBe(false);
  });

  it("clamps a setting outside the Codex range and says so", () => {
    // 2.1.4: 12–14 %; 10 is outside, so 12 applies.
    const result = checkStandards({ codex: { dryMilkSolids: "12" } }, { authorities: ["Codex"], codex: { milkChocolateMilkSolidsMin: 10 } });
    const check = result.standards.find((s) => s.category === "milk chocolate")?.checks.find((c) => c.quantity === "dryMilkSolids");
    expect(check).toMatchObject({ minimum: "12", pass: true });
    expect(result.warnings.map((w) => w.code)).toEqual(["invalid-option"]);
  });

  it("applies the white chocolate milk fat setting (2.1.8: 2.5–3.5 %)", () => {
    const milkFat = (codex?: Record<string, string>) =>
      checkStandards({ codex: { milkFat: "2.5" } }, { authorities: ["Codex"], codex })
        .standards.find((s) => s.category === "white chocolate")
        ?.checks.find((c) => c.quantity === "milkFat")?.pass;
    expect(milkFat()).toBe(false);
    expect(milkFat({ whiteChocolateMilkFatMin: "2.5" })).toBe(true);
  });
});

describe("limits reached through a recipe, exactly", () => {
  const find = (lines: Parameters<typeof evaluateRecipe>[0]["lines"], authority: string, category: string, quantity: string) =>
    evaluateRecipe({ lines }).standards.find((s) => s.authority === authority && s.category === category)?.checks.find((c) => c.quantity === quantity);

  it("passes US milk fat at exactly 3.39 % where binary floats give 3.3899999999999992", () => {
    // 21 CFR 163.130: milk fat ≥ 3.39 %. 4.52 % of a 75 %-fat cream powder = 3.39 exactly;
    // in JS numbers 4.52 * 75 / 100 = 3.3899999999999992, which would fail.
    const cream = { name: "Cream powder", milkFat: 75, milkSolidsNonFat: 23, moisture: 2 };
    const check = find([{ ingredient: cream, percent: 4.52 }, { ingredient: { name: "Sugar", sugar: 100 }, percent: 95.48 }], "US", "milk chocolate", "milkFat");
    expect(check).toMatchObject({ actual: "3.39", minimum: "3.39", pass: true });
  });

  it("fails US sweet chocolate at exactly 12 % milk solids (21 CFR 163.123(a)(2): less than 12 %)", () => {
    const powder = { name: "Milk powder", milkFat: 25, milkSolidsNonFat: 75 };
    const lines = [{ ingredient: powder, percent: 12 }, { ingredient: { name: "Sugar", sugar: 100 }, percent: 88 }];
    expect(find(lines, "US", "sweet chocolate", "dryMilkSolids")).toMatchObject({ actual: "12", pass: false, overBy: "0" });
  });

  it("passes US sweet chocolate at exactly 15 % chocolate liquor (21 CFR 163.123(a)(2))", () => {
    // 2.2 × 15 × (100 − 50) / 100 = 16.5 parts of liquor in 110 parts = 15 %. Lines add to 110,
    // read as parts by mass (with a sum warning), because 15 / 2.2 has no finite decimal.
    const cocoa = { name: "Cocoa mass", cocoaButter: 50, cocoaSolidsNonFat: 50 };
    const lines = [{ ingredient: cocoa, percent: 15 }, { ingredient: { name: "Sugar", sugar: 100 }, percent: 95 }];
    expect(find(lines, "US", "sweet chocolate", "usChocolateLiquor")).toMatchObject({ actual: "15", pass: true });
    const just = [{ ingredient: cocoa, percent: "14.999" }, { ingredient: { name: "Sugar", sugar: 100 }, percent: "95.001" }];
    expect(find(just, "US", "sweet chocolate", "usChocolateLiquor")?.pass).toBe(false);
  });

  it("fails every US category with any vegetable fat (21 CFR 163.150–163.155 coatings)", () => {
    const fat = { name: "Palm kernel fat", vegetableFat: 100 };
    const lines = [{ ingredient: fat, percent: "0.001" }, { ingredient: { name: "Sugar", sugar: 100 }, percent: "99.999" }];
    const us = evaluateRecipe({ lines }).standards.filter((s) => s.authority === "US");
    expect(us.map((s) => s.checks.find((c) => c.quantity === "vegetableFat")?.pass)).toEqual([false, false, false, false]);
  });

  it("judges EU chocolate after deducting inclusions (Annex I notes) but US on the whole product", () => {
    // 56 % of a 100 %-cocoa-solids mass with 20 % inclusions: 56 / 0.8 = 70 % on the EU basis.
    const lines = [
      { ingredient: { name: "Cocoa", cocoaButter: 50, cocoaSolidsNonFat: 50 }, percent: 56 },
      { ingredient: { name: "Sugar", sugar: 100 }, percent: 24 },
      { ingredient: { name: "Almonds", inclusion: true }, percent: 20 },
    ];
    expect(find(lines, "EU", "chocolate", "totalDryCocoaSolids")).toMatchObject({ actual: "70", pass: true });
    // 28 % in the product / 0.8 = 35 % on the EU basis: exactly the A.3(a) minimum.
    const edge = [
      { ingredient: { name: "Cocoa", cocoaButter: 50, cocoaSolidsNonFat: 50 }, percent: 28 },
      { ingredient: { name: "Sugar", sugar: 100 }, percent: 52 },
      { ingredient: { name: "Almonds", inclusion: true }, percent: 20 },
    ];
    expect(find(edge, "EU", "chocolate", "totalDryCocoaSolids")).toMatchObject({ actual: "35", pass: true });
    // US 163.123(a)(2): liquor 2.2 × 28 × 0.5 = 30.8 % of the whole product (nuts included).
    expect(find(edge, "US", "sweet chocolate", "usChocolateLiquor")).toMatchObject({ actual: "30.8", pass: true });
  });
});
