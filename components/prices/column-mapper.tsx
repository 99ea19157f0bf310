"use client";

import { Select } from "@/components/ui/select";
import { PRICE_LIST_FIELDS, type ColumnMapping, type PriceListField } from "@/lib/price-lists/fields";

const NONE = "none";

/** For each of our fields, which column of the file holds it (or none). */
export function ColumnMapper({
  headers,
  sample,
  mapping,
  onChange,
  errors,
}: {
  headers: string[];
  sample: string[][];
  mapping: ColumnMapping;
  onChange: (m: ColumnMapping) => void;
  errors: Record<string, string[] | undefined>;
}) {
  const options = [{ value: NONE, label: "— not in this file —" }, ...headers.map((h, i) => ({ value: String(i), label: `${h} (column ${i + 1})` }))];
  const set = (field: PriceListField, v: string) => onChange({ ...mapping, [field]: v === NONE ? null : Number(v) });
  return (
    <div className="space-y-4">
      <div className="overflow-x-auto rounded-card border border-sand bg-white">
        <table className="w-full text-sm">
          <caption className="px-4 py-2 text-left text-xs text-cocoa-500">The file&apos;s first rows, as written</caption>
          <thead>
            <tr>
              {headers.map((h, i) => (
                <th key={i} scope="col" className="border-b border-sand bg-cream-deep px-3 py-2 text-left text-xs font-semibold text-cocoa-500">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sample.map((cells, r) => (
              <tr key={r}>
                {headers.map((_h, i) => (
                  <td key={i} className="border-b border-sand-light px-3 py-1.5 text-cocoa-700">
                    {cells[i] ?? ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4" data-testid="column-mapping">
        {PRICE_LIST_FIELDS.map((f) => {
          const error = errors[`mapping.${f.key}`]?.[0] ?? errors[f.key]?.[0];
          return (
            <div key={f.key} className="flex flex-col gap-1.5">
              <span className="text-sm font-semibold text-cocoa-700">
                {f.label}
                {f.required ? <span className="text-brick"> *</span> : null}
              </span>
              <Select value={mapping[f.key] === null ? NONE : String(mapping[f.key])} onValueChange={(v) => set(f.key, v)} options={options} ariaLabel={`Column for ${f.label}`} />
              {error ? <span className="text-sm text-brick">{error}</span> : f.hint ? <span className="text-xs text-cocoa-500">{f.hint}</span> : null}
            </div>
          );
        })}
      </div>
    </div>
  );
}
