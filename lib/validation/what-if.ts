import { decimalText } from "./decimal";

/**
 * A what-if price per kg as typed on the costing page (the browser computes
 * with it; nothing is saved). Kept apart from costing.ts so the browser bundle
 * does not pull in the database schema.
 */
export const whatIfPriceSchema = decimalText({ label: "the new price per kg", max: "1000000", decimals: 6 });
