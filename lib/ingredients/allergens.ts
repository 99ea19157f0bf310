/**
 * The substances of Regulation (EU) No 1169/2011 Annex II (the fourteen that
 * must be emphasised in an ingredient list), by our short code. Peanuts, soy,
 * milk, tree nuts, sesame, wheat and the others also cover the US major food
 * allergens (FALCPA, sesame added by the FASTER Act 2021).
 */
export const ALLERGENS = [
  { code: "gluten", label: "Cereals containing gluten", clause: "Annex II point 1" },
  { code: "crustaceans", label: "Crustaceans", clause: "Annex II point 2" },
  { code: "eggs", label: "Eggs", clause: "Annex II point 3" },
  { code: "fish", label: "Fish", clause: "Annex II point 4" },
  { code: "peanuts", label: "Peanuts", clause: "Annex II point 5" },
  { code: "soybeans", label: "Soybeans", clause: "Annex II point 6" },
  { code: "milk", label: "Milk (including lactose)", clause: "Annex II point 7" },
  { code: "nuts", label: "Tree nuts (almond, hazelnut, walnut…)", clause: "Annex II point 8" },
  { code: "celery", label: "Celery", clause: "Annex II point 9" },
  { code: "mustard", label: "Mustard", clause: "Annex II point 10" },
  { code: "sesame", label: "Sesame seeds", clause: "Annex II point 11" },
  { code: "sulphites", label: "Sulphur dioxide and sulphites (> 10 mg/kg)", clause: "Annex II point 12" },
  { code: "lupin", label: "Lupin", clause: "Annex II point 13" },
  { code: "molluscs", label: "Molluscs", clause: "Annex II point 14" },
] as const;

export type AllergenCode = (typeof ALLERGENS)[number]["code"];
export const allergenCodes = ALLERGENS.map((a) => a.code) as [AllergenCode, ...AllergenCode[]];

export function allergenLabel(code: string): string {
  return ALLERGENS.find((a) => a.code === code)?.label ?? code;
}
