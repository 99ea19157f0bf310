/**
 * Names for the ingredient list of each reference ingredient (DEFAULT_INGREDIENTS keys). An
 * ingredient is listed by its legal name, else its customary name (Regulation (EU) No 1169/2011
 * Art. 17 and 18; 21 CFR 101.4(a)). Every name here is from memory unless marked: a qualified
 * person checks them for the market before a label is used.
 */
export interface LabelNames {
  readonly eu: string;
  readonly us: string;
  readonly note: string;
}

export const LABEL_NAMES: Readonly<Record<string, LabelNames>> = {
  "cocoa-nibs": { eu: "cocoa nibs", us: "cacao nibs", note: "US name: 21 CFR 163.110 (from memory)" },
  "cocoa-liquor": { eu: "cocoa mass", us: "chocolate liquor", note: "US name: 21 CFR 163.111 (primary per REFERENCE.md §1); EU: customary name" },
  "cocoa-butter": { eu: "cocoa butter", us: "cocoa butter", note: "Directive 2000/36/EC Annex I A.1 (from memory)" },
  "cocoa-powder-10-12": { eu: "fat-reduced cocoa powder", us: "cocoa", note: "EU: Directive 2000/36/EC Annex I A.2(c), under 20 % cocoa butter; US: 21 CFR 163.114, 10–22 % fat (both from memory)" },
  sucrose: { eu: "sugar", us: "sugar", note: "customary name" },
  "whole-milk-powder": { eu: "whole milk powder", us: "whole milk powder", note: "customary name; US dry whole milk, 21 CFR 131.147 (from memory)" },
  "skim-milk-powder": { eu: "skimmed milk powder", us: "nonfat dry milk", note: "US: 21 CFR 131.125 (from memory)" },
  "buttermilk-powder": { eu: "buttermilk powder", us: "buttermilk powder", note: "customary name" },
  "soy-lecithin": { eu: "emulsifier (soya lecithin)", us: "soy lecithin", note: "EU: category name and specific name, Regulation (EU) No 1169/2011 Annex VII Part C (from memory)" },
  vanilla: { eu: "vanilla", us: "vanilla", note: "customary name" },
};

/** The names of a reference ingredient key, or undefined. */
export function findLabelNames(key: string | null | undefined): LabelNames | undefined {
  return key ? LABEL_NAMES[key] : undefined;
}
