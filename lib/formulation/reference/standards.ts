import type { StandardQuantity } from "../quantities";
import type { Authority, Basis, SourceStatus } from "../types";

/** A Codex minimum that each national authority picks within a range (CXS 87-1981 2.1.4, 2.1.8). */
export type CodexSettingName =
  | "milkChocolateMilkSolidsMin"
  | "milkChocolateMilkFatMin"
  | "whiteChocolateMilkFatMin";

/** One legal limit as data. Percentages are decimal strings; bounds are inclusive unless marked. */
export interface StandardLimit {
  readonly quantity: StandardQuantity;
  readonly minimum?: string;
  readonly maximum?: string;
  /** The maximum itself fails ("less than"). */
  readonly exclusiveMaximum?: true;
  /** When set, the minimum comes from this Codex setting (default and range in CODEX_SETTINGS). */
  readonly codexSetting?: CodexSettingName;
  /** Overrides the category's basis for this one limit. */
  readonly basis?: Basis;
  readonly clause: string;
  readonly status: SourceStatus;
  readonly note?: string;
}

/** One legal category of one authority, with the basis its figures are computed on. */
export interface StandardCategory {
  readonly authority: Authority;
  /** The regulation's own category name, lower case. */
  readonly category: string;
  readonly reference: string;
  readonly basis: Basis;
  readonly limits: readonly StandardLimit[];
}

/** Range and default of each Codex setting; defaults are the top of the range, as agreed in issue 3. */
export const CODEX_SETTINGS: Readonly<
  Record<CodexSettingName, { min: string; max: string; default: string; clause: string; status: SourceStatus }>
> = {
  milkChocolateMilkSolidsMin: { min: "12", max: "14", default: "14", clause: "Codex CXS 87-1981 section 2.1.4", status: "memory" },
  milkChocolateMilkFatMin: { min: "2.5", max: "3.5", default: "3.5", clause: "Codex CXS 87-1981 section 2.1.4", status: "memory" },
  whiteChocolateMilkFatMin: { min: "2.5", max: "3.5", default: "3.5", clause: "Codex CXS 87-1981 section 2.1.8", status: "memory" },
};

const EU = "Directive 2000/36/EC";
const CFR = "21 CFR";
const CODEX = "Codex CXS 87-1981";

const min = (quantity: StandardQuantity, minimum: string, clause: string, status: SourceStatus): StandardLimit => ({
  quantity,
  minimum,
  clause,
  status,
});

/** EU Art. 2(1): vegetable fats other than cocoa butter ≤ 5 %, after deducting other foodstuffs. */
const EU_VEGETABLE_FAT: StandardLimit = {
  quantity: "vegetableFat",
  maximum: "5",
  clause: `${EU} Art. 2(1)`,
  status: "secondary",
  note: "Any vegetable fat needs the label statement 'contains vegetable fats in addition to cocoa butter'.",
};

/**
 * Codex section 2: the same 5 % limit, counted on the finished product after deducting other
 * foodstuffs (not on dry matter), hence the EU basis here. Wording recalled: verify.
 */
const CODEX_VEGETABLE_FAT: StandardLimit = {
  quantity: "vegetableFat",
  maximum: "5",
  basis: "eu",
  clause: `${CODEX} section 2`,
  status: "memory",
};

/** 21 CFR 163: a fat other than cacao fat and milk fat takes a product into the coatings. */
const US_NO_VEGETABLE_FAT: StandardLimit = {
  quantity: "vegetableFat",
  maximum: "0",
  clause: `${CFR} 163.123–163.130`,
  status: "memory",
  note: "Any fat other than cocoa butter and milk fat makes it a coating (21 CFR 163.150–163.155).",
};

/** White chocolate is made of cocoa butter, milk and sugar: no non-fat cocoa solids (definitions). */
const noCocoaSolids = (clause: string, status: SourceStatus): StandardLimit => ({
  quantity: "cocoaSolidsNonFat",
  maximum: "0",
  clause,
  status,
  note: "By definition white chocolate contains no cocoa solids other than cocoa butter.",
});

const usMilkSolidsBelow12 = (clause: string): StandardLimit => ({
  quantity: "dryMilkSolids",
  maximum: "12",
  exclusiveMaximum: true,
  clause,
  status: "primary",
});

/**
 * Every category of the three authorities with its limits, each with its clause and status,
 * from /work/shared/REFERENCE.md section 2. The two "no cocoa solids" rules for white chocolate
 * and the US "no other fat" rule come from the categories' definitions (status memory).
 */
export const STANDARD_CATEGORIES: readonly StandardCategory[] = [
  { authority: "EU", category: "chocolate", reference: `${EU} Annex I A.3(a)`, basis: "eu", limits: [
    min("totalDryCocoaSolids", "35", `${EU} Annex I A.3(a)`, "secondary"),
    min("cocoaButter", "18", `${EU} Annex I A.3(a)`, "secondary"),
    min("cocoaSolidsNonFat", "14", `${EU} Annex I A.3(a)`, "secondary"),
    EU_VEGETABLE_FAT,
  ] },
  { authority: "EU", category: "couverture chocolate", reference: `${EU} Annex I A.3(c)`, basis: "eu", limits: [
    min("totalDryCocoaSolids", "35", `${EU} Annex I A.3(c)`, "secondary"),
    min("cocoaButter", "31", `${EU} Annex I A.3(c)`, "secondary"),
    min("cocoaSolidsNonFat", "2.5", `${EU} Annex I A.3(c)`, "secondary"),
    EU_VEGETABLE_FAT,
  ] },
  { authority: "EU", category: "milk chocolate", reference: `${EU} Annex I A.4(a)`, basis: "eu", limits: [
    min("totalDryCocoaSolids", "25", `${EU} Annex I A.4(a)`, "secondary"),
    min("cocoaSolidsNonFat", "2.5", `${EU} Annex I A.4(a)`, "secondary"),
    min("dryMilkSolids", "14", `${EU} Annex I A.4(a)`, "secondary"),
    min("milkFat", "3.5", `${EU} Annex I A.4(a)`, "secondary"),
    min("totalFat", "25", `${EU} Annex I A.4(a)`, "secondary"),
    EU_VEGETABLE_FAT,
  ] },
  { authority: "EU", category: "couverture milk chocolate", reference: `${EU} Annex I A.4(c)`, basis: "eu", limits: [
    min("totalDryCocoaSolids", "25", `${EU} Annex I A.4(c)`, "memory"),
    min("cocoaSolidsNonFat", "2.5", `${EU} Annex I A.4(c)`, "memory"),
    min("dryMilkSolids", "14", `${EU} Annex I A.4(c)`, "memory"),
    min("milkFat", "3.5", `${EU} Annex I A.4(c)`, "memory"),
    min("totalFat", "31", `${EU} Annex I A.4(c)`, "memory"),
    EU_VEGETABLE_FAT,
  ] },
  { authority: "EU", category: "family milk chocolate", reference: `${EU} Annex I A.5`, basis: "eu", limits: [
    min("totalDryCocoaSolids", "20", `${EU} Annex I A.5`, "primary"),
    min("cocoaSolidsNonFat", "2.5", `${EU} Annex I A.5`, "primary"),
    min("dryMilkSolids", "20", `${EU} Annex I A.5`, "primary"),
    min("milkFat", "5", `${EU} Annex I A.5`, "primary"),
    min("totalFat", "25", `${EU} Annex I A.5`, "primary"),
    EU_VEGETABLE_FAT,
  ] },
  { authority: "EU", category: "white chocolate", reference: `${EU} Annex I A.6`, basis: "eu", limits: [
    min("cocoaButter", "20", `${EU} Annex I A.6`, "memory"),
    min("dryMilkSolids", "14", `${EU} Annex I A.6`, "memory"),
    min("milkFat", "3.5", `${EU} Annex I A.6`, "memory"),
    noCocoaSolids(`${EU} Annex I A.6`, "memory"),
    EU_VEGETABLE_FAT,
  ] },
  { authority: "US", category: "sweet chocolate", reference: `${CFR} 163.123(a)(2)`, basis: "us", limits: [
    min("usChocolateLiquor", "15", `${CFR} 163.123(a)(2)`, "primary"),
    usMilkSolidsBelow12(`${CFR} 163.123(a)(2)`),
    US_NO_VEGETABLE_FAT,
  ] },
  { authority: "US", category: "semisweet chocolate", reference: `${CFR} 163.123(a)(3)`, basis: "us", limits: [
    min("usChocolateLiquor", "35", `${CFR} 163.123(a)(3)`, "primary"),
    usMilkSolidsBelow12(`${CFR} 163.123(a)(3)`),
    US_NO_VEGETABLE_FAT,
  ] },
  { authority: "US", category: "milk chocolate", reference: `${CFR} 163.130`, basis: "us", limits: [
    min("usChocolateLiquor", "10", `${CFR} 163.130`, "primary"),
    min("dryMilkSolids", "12", `${CFR} 163.130`, "primary"),
    min("milkFat", "3.39", `${CFR} 163.130`, "primary"),
    US_NO_VEGETABLE_FAT,
  ] },
  { authority: "US", category: "white chocolate", reference: `${CFR} 163.124`, basis: "us", limits: [
    min("cocoaButter", "20", `${CFR} 163.124`, "primary"),
    min("dryMilkSolids", "14", `${CFR} 163.124`, "primary"),
    min("milkFat", "3.5", `${CFR} 163.124`, "primary"),
    { quantity: "sugar", maximum: "55", clause: `${CFR} 163.124`, status: "primary", note: "Nutritive carbohydrate sweetener." },
    noCocoaSolids(`${CFR} 163.124`, "memory"),
    US_NO_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "chocolate", reference: `${CODEX} section 2.1.1`, basis: "codex", limits: [
    min("totalDryCocoaSolids", "35", `${CODEX} section 2.1.1`, "primary"),
    min("cocoaButter", "18", `${CODEX} section 2.1.1`, "primary"),
    min("cocoaSolidsNonFat", "14", `${CODEX} section 2.1.1`, "primary"),
    CODEX_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "sweet chocolate", reference: `${CODEX} section 2.1.2`, basis: "codex", limits: [
    min("totalDryCocoaSolids", "30", `${CODEX} section 2.1.2`, "secondary"),
    min("cocoaButter", "18", `${CODEX} section 2.1.2`, "secondary"),
    min("cocoaSolidsNonFat", "12", `${CODEX} section 2.1.2`, "secondary"),
    CODEX_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "couverture chocolate", reference: `${CODEX} section 2.1.3`, basis: "codex", limits: [
    min("totalDryCocoaSolids", "35", `${CODEX} section 2.1.3`, "secondary"),
    min("cocoaButter", "31", `${CODEX} section 2.1.3`, "secondary"),
    min("cocoaSolidsNonFat", "2.5", `${CODEX} section 2.1.3`, "secondary"),
    CODEX_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "milk chocolate", reference: `${CODEX} section 2.1.4`, basis: "codex", limits: [
    min("totalDryCocoaSolids", "25", `${CODEX} section 2.1.4`, "memory"),
    min("cocoaSolidsNonFat", "2.5", `${CODEX} section 2.1.4`, "memory"),
    { ...min("dryMilkSolids", "14", `${CODEX} section 2.1.4`, "memory"), codexSetting: "milkChocolateMilkSolidsMin" },
    { ...min("milkFat", "3.5", `${CODEX} section 2.1.4`, "memory"), codexSetting: "milkChocolateMilkFatMin" },
    CODEX_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "family milk chocolate", reference: `${CODEX} section 2.1.5`, basis: "codex", limits: [
    min("totalDryCocoaSolids", "20", `${CODEX} section 2.1.5`, "secondary"),
    min("cocoaSolidsNonFat", "2.5", `${CODEX} section 2.1.5`, "secondary"),
    min("dryMilkSolids", "20", `${CODEX} section 2.1.5`, "secondary"),
    min("milkFat", "5", `${CODEX} section 2.1.5`, "secondary"),
    CODEX_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "milk chocolate couverture", reference: `${CODEX} section 2.1.6`, basis: "codex", limits: [
    min("totalDryCocoaSolids", "25", `${CODEX} section 2.1.6`, "secondary"),
    min("cocoaSolidsNonFat", "2.5", `${CODEX} section 2.1.6`, "secondary"),
    min("dryMilkSolids", "14", `${CODEX} section 2.1.6`, "secondary"),
    min("milkFat", "3.5", `${CODEX} section 2.1.6`, "secondary"),
    min("totalFat", "31", `${CODEX} section 2.1.6`, "secondary"),
    CODEX_VEGETABLE_FAT,
  ] },
  { authority: "Codex", category: "white chocolate", reference: `${CODEX} section 2.1.8`, basis: "codex", limits: [
    min("cocoaButter", "20", `${CODEX} section 2.1.8`, "memory"),
    min("dryMilkSolids", "14", `${CODEX} section 2.1.8`, "memory"),
    { ...min("milkFat", "3.5", `${CODEX} section 2.1.8`, "memory"), codexSetting: "whiteChocolateMilkFatMin" },
    noCocoaSolids(`${CODEX} section 2.1.8`, "memory"),
    CODEX_VEGETABLE_FAT,
  ] },
];

/**
 * Inclusions (other edible foodstuffs) may make up at most 40 % of the finished product:
 * Directive 2000/36/EC Annex I notes; Codex CXS 87-1981 section 2.
 */
export const MAX_INCLUSIONS_PERCENT = "40";

/** One limit with its category, flattened for listing (for example on a "sources" page). */
export interface StandardLimitRow extends StandardLimit {
  readonly authority: Authority;
  readonly category: string;
  /** The basis the limit is computed on. */
  readonly basis: Basis;
}

/**
 * Every limit of STANDARD_CATEGORIES as one flat list, in the same order: authority, category,
 * quantity, minimum or maximum (exclusive when marked), clause, status and basis.
 */
export const STANDARD_LIMITS: readonly StandardLimitRow[] = STANDARD_CATEGORIES.flatMap((category) =>
  category.limits.map((limit) => ({ ...limit, authority: category.authority, category: category.category, basis: limit.basis ?? category.basis })),
);
