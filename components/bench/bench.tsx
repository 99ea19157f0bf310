"use client";

import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { Suspense, useCallback, useEffect, useLayoutEffect, useMemo, useReducer, useRef, useState } from "react";
import { saveRecipeVersionAction } from "@/app/(app)/recipes/[recipeId]/actions";
import { Card, CardHeader } from "@/components/ui/card";
import { OnceVisible } from "@/components/ui/once-visible";
import { useToast } from "@/components/ui/toast";
import { costRecipe, evaluateRecipe, type RecipeLine } from "@/lib/formulation";
import { toIngredientSpec } from "@/lib/recipes/engine-lines";
import { suggestFix } from "@/lib/recipes/fix-suggestions";
import type { LotPriceSource } from "@/lib/recipes/lot-prices";
import type { BenchIngredient, ChocolateType, Draft } from "@/lib/recipes/types";
import { AddLine } from "./add-line";
import { benchReducer, initialBench, RESOLUTION, sameDraft, tidy } from "./bench-state";
import { CompositionPanel } from "./composition-panel";
import { ConflictDialog, type TheirVersion } from "./conflict-dialog";
import { CostPanel } from "./cost-panel";
import { DraftBanner } from "./draft-banner";
import { LineList } from "./line-list";
import { SaveBar } from "./save-bar";
import type { Fixer } from "./standard-category";
import { StandardsPanel } from "./standards-panel";
import { TargetPanel } from "./target-panel";
import { useAfterPaint } from "./use-after-paint";
import { useChosenAuthorities } from "./use-chosen-authorities";
import { clearLocalDraft, readLocalDraft, useLocalDraft, type StoredDraft } from "./use-local-draft";

/**
 * The least-cost panel (and the solver's loader) stays off the bench's load: it is below
 * the fold, so it loads when it scrolls near the viewport (OnceVisible).
 */
const LeastCostPanel = dynamic(() => import("@/components/least-cost/least-cost-panel").then((m) => m.LeastCostPanel), {
  ssr: false,
  loading: () => <LeastCostPlaceholder />,
});

function LeastCostPlaceholder() {
  return (
    <Card>
      <CardHeader title="Least-cost mix" description="Loading…" />
    </Card>
  );
}

export type BenchProps = {
  recipe: { id: string; name: string; chocolateType: ChocolateType; targetCocoaPercent: string | null };
  /** The latest version (versionNo 0 and no lines for a recipe with none). */
  base: { versionNo: number; barMassGrams: string; lines: { ingredientId: string; percent: string }[] };
  library: BenchIngredient[];
  currency: string;
  canEdit: boolean;
  /** False for a viewer who may not see costs: no cost panel (and the library comes without prices). */
  showCosts: boolean;
  /** Bean lots whose nibs can price a nibs or cocoa liquor line instead of the preferred quote. */
  lotSources?: LotPriceSource[];
};

function myCostPerBar(lines: RecipeLine[], barMassGrams: string): string | null {
  const cost = costRecipe(lines, { barMassGrams });
  return cost.ok ? cost.costPerBar : null;
}

function baseDraft(base: BenchProps["base"]): Draft {
  return { barMassGrams: tidy(base.barMassGrams), lines: base.lines.map((l) => ({ ingredientId: l.ingredientId, percent: tidy(l.percent), locked: false })) };
}

/**
 * The bench: lines on sliders, and composition, standards and cost recomputed by
 * the engine in the browser on every move. Saving sends only the lines; the
 * server recomputes everything and refuses a stale base (conflict).
 */
export function Bench({ recipe, base, library, currency, canEdit, showCosts, lotSources }: BenchProps) {
  const router = useRouter();
  const toast = useToast();
  const byId = useMemo(() => new Map(library.map((i) => [i.id, i])), [library]);
  const initial = useMemo(() => baseDraft(base), [base]);
  const [state, dispatch] = useReducer(benchReducer, initialBench(initial, base.versionNo));
  const [authorities, chooseAuthorities] = useChosenAuthorities();
  const [saving, setSaving] = useState(false);
  const [done, setDone] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [theirs, setTheirs] = useState<TheirVersion | null>(null);
  const { note, baseVersionNo: draftBase } = state;

  // Bring back what this browser kept (after a reload or a crash).
  useEffect(() => {
    const kept = canEdit ? readLocalDraft(recipe.id) : null;
    if (kept && kept.lines.every((l) => byId.has(l.ingredientId)) && (!sameDraft(kept, initial) || kept.baseVersionNo !== base.versionNo)) {
      dispatch({ type: "restore", draft: { lines: kept.lines, barMassGrams: kept.barMassGrams }, baseVersionNo: kept.baseVersionNo, note: kept.note, keptAt: kept.savedAt });
    }
  }, [recipe.id, canEdit, byId, initial, base.versionNo]);

  const dirty = !sameDraft(state, initial) || draftBase !== base.versionNo;
  const stored = useMemo<StoredDraft>(
    () => ({ lines: state.lines, barMassGrams: state.barMassGrams, baseVersionNo: draftBase, note, savedAt: new Date().toISOString() }),
    [state.lines, state.barMassGrams, draftBase, note],
  );
  useLocalDraft({ recipeId: recipe.id, draft: stored, dirty, enabled: canEdit && !done });

  const engineLines = useMemo<RecipeLine[]>(
    () => state.lines.map((l) => ({ ingredient: toIngredientSpec(byId.get(l.ingredientId)!), percent: l.percent })),
    [state.lines, byId],
  );
  const evaluation = useMemo(() => evaluateRecipe({ lines: engineLines }), [engineLines]);
  // The standards panel (and its fix search) follows once the move itself is on screen.
  const deferredLines = useAfterPaint(engineLines);
  const deferredStandards = useMemo(
    () => (deferredLines === engineLines ? evaluation.standards : evaluateRecipe({ lines: deferredLines }).standards),
    [deferredLines, engineLines, evaluation],
  );
  // Stable while only percents move, so the panels that read it are not redrawn on every step.
  const lockKey = state.lines.map((l) => (l.locked ? "1" : "0")).join("");
  const locked = useMemo(() => [...lockKey].map((c) => c === "1"), [lockKey]);
  const used = useMemo(() => new Set(state.lines.map((l) => l.ingredientId)), [state.lines]);
  const addLine = useCallback((id: string) => dispatch({ type: "add-line", ingredientId: id }), []);
  const setBarMass = useCallback((v: string) => dispatch({ type: "set-bar-mass", value: v }), []);
  const deferredLocked = useAfterPaint(locked);
  // The target panel reads the lines only when it solves: moving a slider leaves it alone.
  const idKey = state.lines.map((l) => l.ingredientId).join(" ");
  const lineIngredients = useMemo(() => (idKey ? idKey.split(" ") : []).map((id) => toIngredientSpec(byId.get(id)!)), [idKey, byId]);
  const current = useRef({ lines: engineLines, locked });
  useLayoutEffect(() => {
    current.current = { lines: engineLines, locked };
  });
  const readCurrent = useCallback(() => current.current, []);
  const applyPercents = useCallback((percents: string[]) => dispatch({ type: "set-percents", percents }), []);
  const fixer = useMemo<Fixer | undefined>(
    () =>
      canEdit
        ? {
            suggest: (result) => suggestFix(deferredLines, result, { locked: deferredLocked, resolution: RESOLUTION }),
            apply: applyPercents,
            lineName: (i) => deferredLines[i]?.ingredient.name ?? "",
          }
        : undefined,
    [canEdit, deferredLines, deferredLocked, applyPercents],
  );

  async function save(onBase: number) {
    setSaving(true);
    setError(null);
    const result = await saveRecipeVersionAction({
      recipeId: recipe.id,
      baseVersionNo: onBase,
      note: note || undefined,
      barMassGrams: state.barMassGrams,
      lines: state.lines.map(({ ingredientId, percent }) => ({ ingredientId, percent })),
    });
    if (result.ok) {
      setDone(true);
      clearLocalDraft(recipe.id);
      toast({ title: `Saved as v${result.data.versionNo}`, tone: "success" });
      setTheirs(null);
      router.refresh();
      return;
    }
    setSaving(false);
    if (result.code === "conflict") {
      const res = await fetch(`/api/recipes/${recipe.id}/versions/latest`, { cache: "no-store" });
      if (res.ok) return setTheirs(((await res.json()) as { version: TheirVersion }).version);
    }
    setError([result.message, ...Object.values(result.fieldErrors ?? {}).flat()].join(" "));
  }

  function takeTheirs() {
    setDone(true);
    clearLocalDraft(recipe.id);
    setTheirs(null);
    router.refresh();
  }

  function discardRestored() {
    clearLocalDraft(recipe.id);
    dispatch({ type: "reset", draft: initial, baseVersionNo: base.versionNo });
  }

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <div className="space-y-6">
        {state.restoredAt ? <DraftBanner keptAt={state.restoredAt} baseVersionNo={draftBase} latestVersionNo={base.versionNo} onDiscard={discardRestored} /> : null}
        <Card>
          <CardHeader title="Lines" description="Drag, use the arrow keys (Shift for 1 %), or type an exact figure. Lock a line to keep it where it is." />
          <Suspense>
            <LineList lines={state.lines} library={byId} readOnly={!canEdit} message={state.message} dispatch={dispatch} />
          </Suspense>
          {canEdit ? (
            <Suspense>
              <AddLine library={library} used={used} onAdd={addLine} />
              <SaveBar baseVersionNo={draftBase} dirty={dirty} saving={saving} note={note} error={error} onNote={(n) => dispatch({ type: "set-note", note: n })} onSave={() => save(draftBase)} />
            </Suspense>
          ) : null}
        </Card>
        <Suspense>
          <StandardsPanel standards={deferredStandards} chosen={authorities} onChoose={chooseAuthorities} chocolateType={recipe.chocolateType} fixer={fixer} />
        </Suspense>
      </div>
      <div className="space-y-6">
        <Suspense>
          <CompositionPanel composition={evaluation.composition} />
        </Suspense>
        {showCosts ? (
          <Suspense>
          <CostPanel
            lines={engineLines}
            ingredients={state.lines.map((l) => byId.get(l.ingredientId)!)}
            lotSources={lotSources}
            barMassGrams={state.barMassGrams}
            currency={currency}
            onBarMass={canEdit ? setBarMass : undefined}
          />
          </Suspense>
        ) : null}
        {canEdit && state.lines.length >= 2 ? (
          <Suspense>
            <TargetPanel ingredients={lineIngredients} read={readCurrent} chocolateType={recipe.chocolateType} target={recipe.targetCocoaPercent === null ? null : tidy(recipe.targetCocoaPercent)} onApply={applyPercents} />
          </Suspense>
        ) : null}
        {canEdit && state.lines.length >= 2 ? (
          <OnceVisible testId="least-cost-slot" placeholder={<LeastCostPlaceholder />}>
            <LeastCostPanel ingredients={lineIngredients} locked={locked} read={readCurrent} chocolateType={recipe.chocolateType} target={recipe.targetCocoaPercent === null ? null : tidy(recipe.targetCocoaPercent)} currency={currency} resolution={RESOLUTION} onApply={applyPercents} />
          </OnceVisible>
        ) : null}
      </div>
      {theirs ? (
        <ConflictDialog
          mine={{
            baseVersionNo: draftBase,
            lines: state.lines.map((l) => ({ ingredientId: l.ingredientId, name: byId.get(l.ingredientId)?.name ?? "", percent: l.percent })),
            composition: evaluation.composition,
            costPerBar: myCostPerBar(engineLines, state.barMassGrams),
          }}
          theirs={theirs}
          currency={currency}
          busy={saving}
          onSaveMine={() => {
            dispatch({ type: "set-base", baseVersionNo: theirs.versionNo });
            void save(theirs.versionNo);
          }}
          onTakeTheirs={takeTheirs}
          onClose={() => setTheirs(null)}
        />
      ) : null}
    </div>
  );
}
