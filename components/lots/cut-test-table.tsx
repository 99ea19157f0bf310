import { formatDate } from "@/lib/format";

type CutTest = {
  id: string;
  testedOn: string;
  sampleSize: number;
  wellFermented: number;
  partlyFermented: number;
  slaty: number;
  mouldy: number;
  insectDamaged: number;
  germinated: number;
  notes: string | null;
};

export const cutTestCategories = [
  ["wellFermented", "Well fermented"],
  ["partlyFermented", "Partly fermented"],
  ["slaty", "Slaty"],
  ["mouldy", "Mouldy"],
  ["insectDamaged", "Insect-damaged"],
  ["germinated", "Germinated"],
] as const;

export function CutTestTable({ tests }: { tests: CutTest[] }) {
  if (tests.length === 0) return <p className="text-sm text-cocoa-500">No cut test recorded.</p>;
  return (
    <div className="space-y-4">
      {tests.map((t) => (
        <div key={t.id}>
          <p className="text-sm font-semibold">
            {formatDate(t.testedOn)} · {t.sampleSize} beans
          </p>
          <dl className="figures mt-1 grid grid-cols-2 gap-x-6 gap-y-1 text-sm">
            {cutTestCategories.map(([key, label]) => (
              <div key={key} className="flex justify-between border-b border-sand-light">
                <dt>{label}</dt>
                <dd>
                  {t[key]} <span className="text-cocoa-500">({((t[key] / t.sampleSize) * 100).toFixed(0)} %)</span>
                </dd>
              </div>
            ))}
          </dl>
          {t.notes ? <p className="mt-1 text-xs text-cocoa-500">{t.notes}</p> : null}
        </div>
      ))}
    </div>
  );
}
