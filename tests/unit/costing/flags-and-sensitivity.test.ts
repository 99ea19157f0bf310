import { describe, expect, it } from "vitest";
import { batchNeedKg, changedPrice, optionFlags, sensitivity, whatIf, choicesFor, SENSITIVITY_STEPS } from "@/lib/costing";
import { eurOption, line, settings } from "./fixtures";

const ON = "2026-12-01";
const lines = [
  line("Cocoa nibs", "65", [eurOption("Greyfriars Bean Importers", "16.2")]),
  line("Cocoa butter", "8", [eurOption("Bellweather Butters", "19.8")]),
  line("Sugar", "27", [eurOption("Saltmarsh Sugar Company", "1.1")]),
];
const model = settings({ processLossPercent: "4", labourPerKg: "3.5", overheadPerKg: "1.2", overheadPerBar: "0.05", packagingPerBar: "0.3", wholesalePricePerBar: "2.8" });
const base = { lines, choices: choicesFor(lines, "chosen", ON), settings: model, barMassGrams: "70" };
const sugarId = lines[2]!.ingredientId;

describe("sensitivity", () => {
  it("charts −20 % to +50 % in steps of 5", () => {
    expect(SENSITIVITY_STEPS).toEqual([-20, -15, -10, -5, 0, 5, 10, 15, 20, 25, 30, 35, 40, 45, 50]);
    expect(changedPrice("1.1", 50)).toBe("1.65");
    expect(changedPrice("1.1", -20)).toBe("0.88");
  });

  it("moves the cost per bar and the margin with the price of sugar", () => {
    const result = sensitivity(base, sugarId);
    if (!result.ok) throw new Error(result.reason);
    const at = (change: number) => result.points.find((p) => p.changePercent === change)!;
    // 0 %: 1.58396875 (worked in hand-worked.test.ts), margin at 2.80 = 43.4296875 %.
    expect(at(0)).toMatchObject({ perKg: "1.1", costPerBar: "1.58396875", wholesaleMargin: "43.4296875", retailMargin: null });
    // +50 %: sugar 1.65; per kg 10.53 + 1.584 + 0.4455 = 12.5595; ÷ 0.96 = 13.0828125; × 0.07 = 0.915796875;
    // + labour 0.245 + overhead 0.134 + packaging 0.3 = 1.594796875. Margin (2.8 − 1.594796875) ÷ 2.8 = 43.04296875 %.
    expect(at(50)).toMatchObject({ perKg: "1.65", costPerBar: "1.594796875", wholesaleMargin: "43.04296875" });
    // −20 %: sugar 0.88; per kg 12.3516; ÷ 0.96 = 12.86625; × 0.07 = 0.9006375; + 0.679 = 1.5796375.
    expect(at(-20)).toMatchObject({ perKg: "0.88", costPerBar: "1.5796375" });
  });

  it("refuses an ingredient that is not in the version", () => {
    expect(sensitivity(base, "00000000-0000-4000-8000-999999999999")).toEqual({ ok: false, reason: "That ingredient is not in this version." });
  });
});

describe("whatIf", () => {
  it("shows the result of a new price without touching the combination", () => {
    const result = whatIf(base, sugarId, "1.65");
    if (!result.ok) throw new Error(result.reason);
    expect(result.changePercent).toBe("50");
    expect(result.before.cost.ok && result.before.cost.costPerBar).toBe("1.58396875");
    expect(result.after.cost.ok && result.after.cost.costPerBar).toBe("1.594796875");
    expect(base.choices[2]!.perKg).toBe("1.1");
  });
});

describe("buying flags", () => {
  it("compares a minimum order with one batch's need and a lead time with the wait the buyer allows", () => {
    // 50 kg batch × 27 % sugar = 13.5 kg (scaleBatch, whole grams).
    const need = batchNeedKg(lines, "50")!;
    expect(need.get(sugarId)).toBe("13.5");
    const option = eurOption("Saltmarsh Sugar Company", "1.1", { minimumOrderKg: "25", leadTimeDays: 42, validUntil: "2026-12-20" });
    const flags = optionFlags(option, { settings: settings({ needWithinDays: 30 }), needKg: "13.5", on: ON });
    expect(flags).toEqual([
      { code: "minimum-order", severity: "warn", message: "Minimum order 25 kg, more than the 13.5 kg one batch needs." },
      { code: "lead-time", severity: "warn", message: "Lead time 42 days, longer than the 30 days you can wait." },
      { code: "expires", severity: "warn", message: "Quote valid until 2026-12-20." },
    ]);
  });

  it("only informs when the order and the wait fit", () => {
    const option = eurOption("Saltmarsh Sugar Company", "1.1", { minimumOrderKg: "10", leadTimeDays: 10, validUntil: "2027-06-30" });
    const flags = optionFlags(option, { settings: settings({ needWithinDays: 30 }), needKg: "13.5", on: ON });
    expect(flags.map((f) => f.severity)).toEqual(["info", "info"]);
    expect(batchNeedKg(lines, null)).toBeNull();
  });
});
