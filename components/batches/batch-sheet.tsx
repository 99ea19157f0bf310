import QRCode from "qrcode";
import { formatGrams } from "@/lib/batches/format-mass";
import { groupLoads, PAGE_PER_LOAD_LIMIT } from "@/lib/batches/group-loads";
import { GUIDE_SOURCE, PROCESS_CAUTION, processGuide } from "@/lib/batches/process-guide";
import { sheetAllergens, sheetLoads } from "@/lib/batches/sheet";
import { inWeighingOrder } from "@/lib/batches/weighing-order";
import type { BatchDetail } from "@/lib/data/batches";
import { formatDate, formatNumber, formatPercent } from "@/lib/format";
import { SheetSection, SignatureLines, TickBox, WeighingTable } from "./sheet-parts";

const TYPE = { dark: "Dark", milk: "Milk", white: "White", other: "Other" } as const;

function SheetHeader({ batch, qr, subtitle }: { batch: BatchDetail; qr: string; subtitle: string }) {
  return (
    <header className="flex items-start justify-between gap-4 border-b-2 border-cocoa pb-2">
      <div>
        <p className="text-[9pt] uppercase tracking-widest text-cocoa-500">Batch sheet · {subtitle}</p>
        <h1 className="text-[18pt] font-bold leading-tight">
          {batch.recipeName} <span className="font-normal">v{batch.versionNo}</span>
        </h1>
        <p className="font-mono text-[14pt] font-bold tracking-wider" data-testid="sheet-code">
          {batch.code}
        </p>
      </div>
      {/* The batch code as a QR code (ISO/IEC 18004), for scanning at the bench; the text above is the same code. */}
      <div className="h-[22mm] w-[22mm] shrink-0" role="img" aria-label={`QR code of ${batch.code}`} dangerouslySetInnerHTML={{ __html: qr }} />
    </header>
  );
}

/** The printable batch sheet: header, totals, allergens, process, signatures, then the loads. */
export async function BatchSheet({ batch, printedOn }: { batch: BatchDetail; printedOn: string }) {
  const qr = await QRCode.toString(batch.code, { type: "svg", margin: 0, errorCorrectionLevel: "M" });
  const step = batch.resolutionGrams;
  const loads = sheetLoads(batch);
  const allergens = sheetAllergens(batch.lines);
  const guide = processGuide({
    chocolateType: batch.chocolateType,
    roast: { presetName: batch.roastPresetName, temperatureC: batch.roastTemperatureC, minutes: batch.roastMinutes },
    refiningHours: batch.refiningHours,
    conchingHours: batch.conchingHours,
  });
  const perLoad = loads.length <= PAGE_PER_LOAD_LIMIT;
  const facts: [string, string][] = [
    ["Chocolate", TYPE[batch.chocolateType]],
    ["Planned for", formatDate(batch.plannedFor)],
    ["Batch mass", formatGrams(batch.totalMassGrams, step)],
    ["Loads", batch.machineName ? `${batch.loadCount} × ${batch.machineName} (${formatNumber(batch.machineCapacityKg, 1)} kg)` : "1"],
    ["Scale", `${batch.stationName}, ${step} g step`],
    ["Bar mass", `${formatNumber(batch.barMassGrams, 0)} g`],
  ];
  return (
    <article className="space-y-0">
      <section className="sheet-page">
        <SheetHeader batch={batch} qr={qr} subtitle={`printed ${formatDate(printedOn)}`} />
        <dl className="mt-2 grid grid-cols-3 gap-x-6 gap-y-1 text-[9.5pt]">
          {facts.map(([k, v]) => (
            <div key={k}>
              <dt className="text-cocoa-500">{k}</dt>
              <dd className="figures font-semibold">{v}</dd>
            </div>
          ))}
        </dl>
        <SheetSection title="Whole batch">
          <table className="w-full border-collapse text-[10pt]" data-testid="sheet-totals">
            <tbody>
              {inWeighingOrder(batch.lines).map((l) => (
                <tr key={l.id} className="border-b border-sand">
                  <td className="py-1">{l.ingredientName}</td>
                  <td className="figures py-1 text-right">{formatPercent(l.percent, 2)}</td>
                  <td className="figures py-1 text-right font-semibold">{formatGrams(l.massGrams, step)}</td>
                </tr>
              ))}
              <tr>
                <td className="py-1 font-bold">Total</td>
                <td className="figures py-1 text-right">100 %</td>
                <td className="figures py-1 text-right font-bold" data-testid="sheet-total">
                  {formatGrams(batch.totalMassGrams, step)}
                </td>
              </tr>
            </tbody>
          </table>
          {batch.scaleNotes.map((n) => (
            <p key={n} className="mt-1 text-[9pt] text-brick">
              {n}
            </p>
          ))}
        </SheetSection>
        <SheetSection title="Allergens">
          <p className="font-semibold" data-testid="sheet-allergens">
            {allergens.length ? `Contains: ${allergens.join(", ")}.` : "No allergen is listed for this version's ingredients."}
          </p>
          <p className="text-[9pt] text-cocoa-700">
            From the ingredients of v{batch.versionNo} (EU Regulation 1169/2011 Annex II). Check cross-contact on shared refiners, conches and moulds,
            and label as the rules where you sell require.
          </p>
        </SheetSection>
        <SheetSection title="Process">
          <table className="w-full border-collapse text-[9.5pt]">
            <thead>
              <tr className="border-b border-cocoa text-left">
                <th className="py-0.5 pr-2">Step</th>
                <th className="py-0.5 pr-2">Parameter</th>
                <th className="py-0.5 pr-2">Planned</th>
                <th className="py-0.5 pr-2">Typical</th>
                <th className="w-24 py-0.5">Actual</th>
              </tr>
            </thead>
            <tbody>
              {guide.flatMap((s) =>
                s.parameters.map((p, i) => (
                  <tr key={`${s.key}-${p.label}`} className="border-b border-sand align-top">
                    <td className="py-1 pr-2 font-semibold">{i === 0 ? s.title : ""}</td>
                    <td className="py-1 pr-2">{p.label}</td>
                    <td className="py-1 pr-2">{p.planned ?? "—"}</td>
                    <td className="py-1 pr-2 text-cocoa-700">{p.typical}</td>
                    <td className="py-1">
                      <span className="inline-block w-full border-b border-cocoa-300">&nbsp;</span>
                    </td>
                  </tr>
                )),
              )}
            </tbody>
          </table>
          <ul className="mt-1 list-disc pl-5 text-[9pt] text-cocoa-700">
            {guide.filter((s) => s.note).map((s) => (
              <li key={s.key}>{s.note}</li>
            ))}
          </ul>
          <p className="mt-1 text-[9pt] text-cocoa-500">{GUIDE_SOURCE}</p>
          <p className="sheet-keep mt-2 rounded border border-brick px-2 py-1 text-[9.5pt] font-semibold text-brick" role="note">
            {PROCESS_CAUTION}
          </p>
        </SheetSection>
        {batch.notes ? (
          <SheetSection title="Notes">
            <p>{batch.notes}</p>
          </SheetSection>
        ) : null}
        <SignatureLines roles={["Planned by", "Made by", "Checked by"]} />
      </section>
      {perLoad
        ? loads.map((load) => (
            <section key={load.loadNo} className="sheet-page" data-testid="sheet-load">
              <SheetHeader batch={batch} qr={qr} subtitle={`load ${load.loadNo} of ${loads.length}`} />
              <SheetSection title={`Load ${load.loadNo} of ${loads.length} — ${formatGrams(load.massGrams, step)}`}>
                <WeighingTable lines={load.lines} totalGrams={load.massGrams} step={step} />
              </SheetSection>
              <SignatureLines roles={["Weighed by", "Loaded by", "Checked by"]} />
            </section>
          ))
        : groupLoads(loads).map((group) => (
            <section key={group.label} className="sheet-page" data-testid="sheet-load">
              <SheetHeader batch={batch} qr={qr} subtitle={`${group.loadNos.length} identical loads`} />
              <SheetSection title={`Loads ${group.label} — ${formatGrams(group.load.massGrams, step)} each`}>
                <WeighingTable lines={group.load.lines} totalGrams={group.load.massGrams} step={step} />
                <p className="mt-3 text-[9.5pt]">Tick each load when weighed:</p>
                <div className="mt-1 flex flex-wrap gap-x-2 gap-y-1 text-[8pt]">
                  {group.loadNos.map((n) => (
                    <span key={n} className="inline-flex items-center gap-0.5">
                      <TickBox />
                      {n}
                    </span>
                  ))}
                </div>
              </SheetSection>
              <SignatureLines roles={["Weighed by", "Loaded by", "Checked by"]} />
            </section>
          ))}
    </article>
  );
}
