import { describe, expect, it } from "vitest";
import { celsiusToFahrenheit, checkChainRecord, nibCostPerKg, summariseChain } from "@/lib/formulation";

// A hand-worked lot (invented figures): 100 kg of raw beans received.
//   sorting:   in 100,   kept 97,     rejects 3          → yield 97 %, rejects 3 %
//   roasting:  in 97,    out 92.15                       → loss 4.85 / 97 = 5 %
//   winnowing: in 92.15, nibs 78, shell 12.9, dust 1.25  → shell 12.9 / 92.15 = 13.9989 %;
//              78 + 12.9 + 1.25 = 92.15, nothing unaccounted
//   nib yield from raw beans: 78 / 100 = 78 %
// Typical ranges (REFERENCE.md §5, common practice, no single source): roast loss 4–6 %,
// shell 10–15 %, nib yield 75–82 %; all figures above sit inside them.
const lot = {
  massReceivedKg: "100",
  estimatedNibYieldPercent: "78",
  records: [
    { step: "sorting" as const, massInKg: "100", massOutKg: "97", rejectsKg: "3" },
    { step: "roasting" as const, massInKg: "97", massOutKg: "92.15" },
    { step: "winnowing" as const, massInKg: "92.15", massOutKg: "78", shellKg: "12.9", dustKg: "1.25" },
  ],
};

describe("summariseChain", () => {
  it("gives each step's yield and loss and the cumulative nib yield of a hand-worked lot", () => {
    const s = summariseChain(lot);
    expect(s.steps.map((x) => [x.step, x.massInKg, x.massOutKg, x.yieldPercent])).toEqual([
      ["sorting", "100", "97", "97"],
      ["roasting", "97", "92.15", "95"],
      ["winnowing", "92.15", "78", "84.64460119370591427021161150298426"],
    ]);
    expect(s.steps[0]!.lossPercent).toBe("3");
    expect(s.steps[1]!.lossPercent).toBe("5");
    expect(Number(s.steps[2]!.lossPercent).toFixed(4)).toBe("13.9989");
    expect(s.nibMassKg).toBe("78");
    expect(s.nibMassEstimated).toBe(false);
    expect(s.cumulativeYieldPercent).toBe("78");
    expect(s.notices).toEqual([]);
  });

  it("adds up several roasts of one lot", () => {
    const s = summariseChain({
      ...lot,
      records: [
        lot.records[0]!,
        { step: "roasting", massInKg: "50", massOutKg: "47.5" },
        { step: "roasting", massInKg: "47", massOutKg: "44.65" },
      ],
    });
    // (50 + 47) in, (47.5 + 44.65) = 92.15 out → loss 4.85 / 97 = 5 %.
    expect(s.steps[1]).toMatchObject({ records: 2, massInKg: "97", massOutKg: "92.15", lossPercent: "5" });
  });

  it("estimates nibs from the workspace's yield until winnowing is recorded", () => {
    const s = summariseChain({ ...lot, records: lot.records.slice(0, 2), estimatedNibYieldPercent: "78" });
    // 100 kg × 78 % = 78 kg, shown as an estimate.
    expect(s).toMatchObject({ nibMassKg: "78", nibMassEstimated: true, cumulativeYieldPercent: "78" });
  });

  it("flags a roast loss and a shell fraction outside the usual ranges, and unaccounted mass", () => {
    const s = summariseChain({
      massReceivedKg: "100",
      estimatedNibYieldPercent: "78",
      records: [
        // loss 10 / 100 = 10 % > 6 % (REFERENCE.md §5, practice)
        { step: "roasting", massInKg: "100", massOutKg: "90" },
        // shell 20 / 90 = 22.2 % > 15 %; nibs 60 + shell 20 + dust 2 = 82, 8 kg unaccounted (> 1 %)
        { step: "winnowing", massInKg: "90", massOutKg: "60", shellKg: "20", dustKg: "2" },
      ],
    });
    const codes = s.notices.map((n) => n.code);
    expect(codes).toEqual(["outside-range", "outside-range", "unaccounted", "outside-range"]);
    expect(s.notices[0]!.message).toBe(
      "Roast loss is 10.0 %, outside the usual 4–6 % (≈ 4–6 % of bean mass: common practice, no single source).",
    );
    expect(s.notices[2]!.message).toBe("8 kg of the 90 kg winnowed is not recorded as nibs, shell or dust.");
    // nib yield 60 % < 75 %
    expect(s.notices[3]!.message).toMatch(/^Nib yield from raw beans is 60\.0 %, outside the usual 75–82 %/);
  });

  it("flags a step that takes in more than the step before gave", () => {
    const s = summariseChain({
      massReceivedKg: "100",
      estimatedNibYieldPercent: "78",
      records: [
        { step: "sorting", massInKg: "100", massOutKg: "96", rejectsKg: "4" },
        { step: "roasting", massInKg: "98", massOutKg: "93" },
      ],
    });
    expect(s.notices.map((n) => n.message)).toContain("Roasting took in 98 kg, more than the 96 kg the step before gave.");
  });
});

describe("checkChainRecord", () => {
  it("refuses more out than in, and parts that exceed the mass in", () => {
    expect(checkChainRecord({ step: "roasting", massInKg: "10", massOutKg: "10.5" })[0]?.message).toBe(
      "Mass out (10.5 kg) is more than mass in (10 kg).",
    );
    expect(checkChainRecord({ step: "sorting", massInKg: "10", massOutKg: "9.5", rejectsKg: "0.6" })[0]?.code).toBe("parts-exceed-in");
    expect(checkChainRecord({ step: "winnowing", massInKg: "10", massOutKg: "8", shellKg: "1.5", dustKg: "0.5" })).toEqual([]);
    expect(checkChainRecord({ step: "sorting", massInKg: "0", massOutKg: "0" })[0]?.code).toBe("invalid");
    expect(checkChainRecord({ step: "sorting", massInKg: "abc", massOutKg: "1" })[0]?.code).toBe("invalid");
  });
});

describe("nibCostPerKg", () => {
  it("divides everything paid by the nibs obtained", () => {
    // (450 price + 40 freight + 10 duty + 12 roasting labour) / 78 kg = 512 / 78 = 6.5641025641… per kg
    const c = nibCostPerKg({ pricePaid: "450", extraCosts: ["40", "10"], processingCosts: ["12"], nibMassKg: "78" });
    expect(c?.startsWith("6.564102564102564")).toBe(true);
    expect(nibCostPerKg({ pricePaid: "450", nibMassKg: "0" })).toBeNull();
  });
});

describe("celsiusToFahrenheit", () => {
  it("converts exactly", () => {
    // F = C × 9/5 + 32: 132 °C = 269.6 °F; 100 °C = 212 °F (definition of the scales).
    expect(celsiusToFahrenheit("132")).toBe("269.6");
    expect(celsiusToFahrenheit(100)).toBe("212");
  });
});
