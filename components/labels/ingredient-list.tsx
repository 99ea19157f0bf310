import type { StatementItem } from "@/lib/formulation";

/**
 * "Ingredients: a, b, c." with each item's segments; emphasised segments (allergens) in bold,
 * the EU way of setting them apart (Regulation (EU) No 1169/2011 Art. 21(1)(b)).
 */
export function IngredientList({ items, testId }: { items: StatementItem[]; testId: string }) {
  if (items.length === 0) return <p className="text-sm text-brick">This version has no ingredients with mass.</p>;
  return (
    <p className="leading-relaxed" data-testid={testId}>
      <span className="font-semibold">Ingredients: </span>
      {items.map((item, i) => (
        <span key={item.name}>
          {item.segments.map((s, j) => (s.emphasis ? <strong key={j} className="font-extrabold">{s.text}</strong> : <span key={j}>{s.text}</span>))}
          {i < items.length - 1 ? ", " : "."}
        </span>
      ))}
    </p>
  );
}
