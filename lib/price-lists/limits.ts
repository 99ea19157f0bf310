/** 2 MiB: a supplier's price list of a few thousand lines is far smaller. */
export const MAX_PRICE_LIST_BYTES = 2 * 1024 * 1024;
/** Data rows per upload; more is almost certainly the wrong file. */
export const MAX_PRICE_LIST_ROWS = 5000;
