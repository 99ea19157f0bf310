import { Table, Td, Th } from "@/components/ui/table";
import type { DiffRow } from "@/lib/recipes/diff";
import { signed } from "@/lib/recipes/format";

/** Two versions' figures side by side with the change; changed rows stand out. */
export function DiffTable({ rows, a, b, format, unit }: { rows: DiffRow[]; a: string; b: string; format: (v: string | null) => string; unit: string }) {
  return (
    <Table>
      <thead>
        <tr>
          <Th />
          <Th numeric>{a}</Th>
          <Th numeric>{b}</Th>
          <Th numeric>Change</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.key} className={r.changed ? "bg-pod-light/50" : undefined} data-testid={`diff-${r.key}`}>
            <Td className={r.changed ? "font-semibold" : undefined}>{r.label}</Td>
            <Td numeric>{format(r.a)}</Td>
            <Td numeric>{format(r.b)}</Td>
            <Td numeric>{r.delta === null ? (r.a === null ? "added" : r.b === null ? "removed" : "—") : `${signed(r.delta, unit === "%" ? 1 : 3)} ${unit}`}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
