import Decimal from "decimal.js";
import { rebalance } from "@/lib/formulation";
import type { Draft, DraftLine } from "@/lib/recipes/types";

/** The bench's slider step, in percent (the engine's default grid). */
export const RESOLUTION = "0.1";
export const RESOLUTION_DECIMALS = 1;

export type BenchState = Draft & {
  /** The engine's last sentence about a move it could not make as asked. */
  message: string | null;
  /** The version the draft started from (what a save names as its base). */
  baseVersionNo: number;
  note: string;
  /** When the draft came back from this browser's storage: when it was kept. */
  restoredAt: string | null;
};

/** A fresh bench on a saved version (or on nothing, version 0). */
export function initialBench(draft: Draft, baseVersionNo: number): BenchState {
  return { ...draft, message: null, baseVersionNo, note: "", restoredAt: null };
}

export type BenchAction =
  | { type: "set-percent"; index: number; value: string }
  | { type: "toggle-lock"; index: number }
  | { type: "add-line"; ingredientId: string }
  | { type: "remove-line"; index: number }
  | { type: "set-percents"; percents: string[] }
  | { type: "set-bar-mass"; value: string }
  | { type: "set-note"; note: string }
  | { type: "set-base"; baseVersionNo: number }
  | { type: "restore"; draft: Draft; baseVersionNo: number; note: string; keptAt: string }
  | { type: "reset"; draft: Draft; baseVersionNo: number };

const lockedOf = (lines: DraftLine[]) => lines.map((l) => l.locked);

/** Percents as the bench shows and sends them: on the grid, no trailing zeros. */
export const tidy = (percent: string) => new Decimal(percent).toFixed();

/**
 * The bench's state changes. Every percent change goes through the engine's
 * rebalance, so the lines always add up to exactly 100 % and locked lines
 * never move; what it could not do is said in `message`.
 */
export function benchReducer(state: BenchState, action: BenchAction): BenchState {
  switch (action.type) {
    case "set-percent": {
      const moved = rebalance(state.lines, action.index, action.value, { locked: lockedOf(state.lines), resolution: RESOLUTION });
      return { ...state, lines: moved.lines.map((l) => ({ ...l, percent: tidy(l.percent) })), message: moved.message ?? null };
    }
    case "toggle-lock":
      return { ...state, lines: state.lines.map((l, i) => (i === action.index ? { ...l, locked: !l.locked } : l)), message: null };
    case "add-line": {
      if (state.lines.some((l) => l.ingredientId === action.ingredientId)) return { ...state, message: "That ingredient is already a line of the recipe." };
      const percent = state.lines.length === 0 ? "100" : "0";
      return { ...state, lines: [...state.lines, { ingredientId: action.ingredientId, percent, locked: false }], message: null };
    }
    case "remove-line": {
      const line = state.lines[action.index];
      if (!line) return state;
      if (new Decimal(line.percent).isZero() || state.lines.length === 1) return { ...state, lines: state.lines.filter((_, i) => i !== action.index), message: null };
      // Bring the line to 0 first so the other unlocked lines take up its share.
      const moved = rebalance(state.lines, action.index, "0", { locked: lockedOf(state.lines), resolution: RESOLUTION });
      if (moved.clamped) return { ...state, message: "Unlock another line first: its share has to go somewhere." };
      const rest = moved.lines.filter((_, i) => i !== action.index).map((l) => ({ ...l, percent: tidy(l.percent) }));
      return { ...state, lines: rest, message: null };
    }
    case "set-percents":
      return { ...state, lines: state.lines.map((l, i) => ({ ...l, percent: tidy(action.percents[i] ?? l.percent) })), message: null };
    case "set-bar-mass":
      return { ...state, barMassGrams: action.value };
    case "set-note":
      return { ...state, note: action.note };
    case "set-base":
      return { ...state, baseVersionNo: action.baseVersionNo };
    case "restore":
      return { ...action.draft, message: null, baseVersionNo: action.baseVersionNo, note: action.note, restoredAt: action.keptAt };
    case "reset":
      return initialBench(action.draft, action.baseVersionNo);
  }
}

/** The lines' total in percent, as a decimal string. */
export function totalPercent(lines: readonly DraftLine[]): string {
  return lines.reduce((sum, l) => sum.plus(new Decimal(l.percent)), new Decimal(0)).toFixed();
}

/** Whether two drafts save to the same version (locks are not saved). */
export function sameDraft(a: Draft, b: Draft): boolean {
  if (a.barMassGrams !== b.barMassGrams || a.lines.length !== b.lines.length) return false;
  return a.lines.every((l, i) => l.ingredientId === b.lines[i]!.ingredientId && new Decimal(l.percent).eq(new Decimal(b.lines[i]!.percent)));
}
