import { quoteDedupeKey, type QuoteIdentity } from "@/lib/pricing/dedupe-key";
import { invalid } from "@/lib/errors";
import type { Row } from "./format";

export type IdMaps = Record<string, Map<string, string>>;

/**
 * Values that embed ids without being id columns, rewritten for the new rows
 * (the round-trip test finds any old id left anywhere in a re-export):
 * a quote's `source` names the price-list upload it came from, and its
 * `dedupeKey` is a hash over the supplier and ingredient ids.
 * `attachments.storageKey` is replaced when the file copies are stored.
 */
export const ROW_FIXUPS: Readonly<Record<string, (row: Row, maps: IdMaps, where: string) => Row>> = {
  price_quotes: (row, maps, where) => {
    const source = String(row.source);
    const upload = /^price-list:(.+)$/.exec(source);
    let next = source;
    if (upload) {
      const mapped = maps.price_list_imports?.get(upload[1]!);
      if (!mapped) throw invalid(`${where}: its source names a price-list upload that is not in the file. Nothing was imported.`);
      next = `price-list:${mapped}`;
    }
    return { ...row, source: next, dedupeKey: quoteDedupeKey(row as unknown as QuoteIdentity) };
  },
};
