import type { ReactNode } from "react";
import { formatGrams } from "@/lib/batches/format-mass";
import type { SheetLine } from "@/lib/batches/sheet";

/** A box to tick by hand. */
export const TickBox = () => <span aria-hidden className="inline-block h-3.5 w-3.5 border border-cocoa" />;

/** A line to write on. */
export const WriteLine = ({ className = "w-full" }: { className?: string }) => <span className={`inline-block border-b border-cocoa-300 ${className}`}>&nbsp;</span>;

export function SheetSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="mt-4">
      <h2 className="sheet-heading mb-1 border-b border-cocoa pb-0.5 text-[11pt] font-bold uppercase tracking-wide">{title}</h2>
      {children}
    </section>
  );
}

/** One load's weighing list: tick, ingredient, mass, lot code, initials. */
export function WeighingTable({ lines, totalGrams, step }: { lines: SheetLine[]; totalGrams: string; step: string }) {
  return (
    <table className="w-full border-collapse text-[10pt]">
      <thead>
        <tr className="border-b border-cocoa text-left">
          <th className="w-8 py-1">✓</th>
          <th className="py-1">Ingredient</th>
          <th className="py-1 text-right">Mass</th>
          <th className="w-40 py-1 pl-4">Lot code</th>
          <th className="w-16 py-1 pl-2">Initials</th>
        </tr>
      </thead>
      <tbody>
        {lines.map((l) => (
          <tr key={l.lineId} className="border-b border-sand">
            <td className="py-2">
              <TickBox />
            </td>
            <td className="py-2">
              {l.ingredientName}
              {l.overScale ? <span className="block text-[9pt] text-brick">More than this scale takes: weigh in parts.</span> : null}
            </td>
            <td className="figures py-2 text-right font-semibold">{formatGrams(l.massGrams, step)}</td>
            <td className="py-2 pl-4">
              <WriteLine />
            </td>
            <td className="py-2 pl-2">
              <WriteLine />
            </td>
          </tr>
        ))}
        <tr>
          <td />
          <td className="py-1.5 font-bold">Total</td>
          <td className="figures py-1.5 text-right font-bold">{formatGrams(totalGrams, step)}</td>
          <td colSpan={2} />
        </tr>
      </tbody>
    </table>
  );
}

/** Who did it, who checked it, when. */
export function SignatureLines({ roles }: { roles: string[] }) {
  return (
    <div className="sheet-keep mt-6 grid grid-cols-3 gap-6 text-[9.5pt]">
      {roles.map((r) => (
        <div key={r}>
          <WriteLine />
          <p className="mt-1 text-cocoa-500">{r} — signature and date</p>
        </div>
      ))}
    </div>
  );
}
