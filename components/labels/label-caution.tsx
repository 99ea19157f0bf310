/** The caution every label view and printout carries: figures are computed, a person decides. */
export function LabelCaution({ compact = false }: { compact?: boolean }) {
  const text =
    "Computed from the recipe and the ingredient library. Before this label is used, a qualified person must check it against the rules of each market where the bar is sold (names, allergens, nutrition figures, format and languages).";
  if (compact) return <p className="text-xs italic" data-testid="label-caution">Draft for checking, not final artwork. {text}</p>;
  return (
    <div role="note" className="rounded-card border-2 border-brick bg-brick-light px-4 py-3 text-sm text-brick" data-testid="label-caution">
      <p className="font-bold">Check before use</p>
      <p className="mt-1">{text}</p>
    </div>
  );
}
