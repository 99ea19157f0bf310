"use client";

import { useEffect, useRef } from "react";
import type { Draft } from "@/lib/recipes/types";

/** What the browser keeps of an unsaved draft. */
export type StoredDraft = Draft & { baseVersionNo: number; note: string; savedAt: string };

const keyOf = (recipeId: string) => `barwright:draft:${recipeId}`;

function isStoredDraft(v: unknown): v is StoredDraft {
  const d = v as StoredDraft | null;
  return (
    !!d &&
    typeof d.baseVersionNo === "number" &&
    typeof d.barMassGrams === "string" &&
    Array.isArray(d.lines) &&
    d.lines.every((l) => typeof l?.ingredientId === "string" && typeof l.percent === "string" && typeof l.locked === "boolean")
  );
}

/** The draft this browser kept for the recipe, if any (a damaged one is ignored). */
export function readLocalDraft(recipeId: string): StoredDraft | null {
  try {
    const raw = window.localStorage.getItem(keyOf(recipeId));
    const parsed: unknown = raw ? JSON.parse(raw) : null;
    return isStoredDraft(parsed) ? parsed : null;
  } catch {
    return null;
  }
}

export function clearLocalDraft(recipeId: string): void {
  try {
    window.localStorage.removeItem(keyOf(recipeId));
  } catch {
    /* storage unavailable: nothing was kept */
  }
}

/**
 * Keeps the unsaved draft in this browser (a quarter second after the last
 * change, and at once when the page is hidden) so a reload or a crash loses
 * nothing, and asks before leaving while there are unsaved changes.
 */
export function useLocalDraft({ recipeId, draft, dirty, enabled }: { recipeId: string; draft: StoredDraft; dirty: boolean; enabled: boolean }): void {
  const latest = useRef({ draft, dirty });
  useEffect(() => {
    latest.current = { draft, dirty };
  });

  useEffect(() => {
    if (!enabled) return;
    const write = () => {
      const { draft: d, dirty: isDirty } = latest.current;
      try {
        if (isDirty) window.localStorage.setItem(keyOf(recipeId), JSON.stringify(d));
        else window.localStorage.removeItem(keyOf(recipeId));
      } catch {
        /* storage full or blocked: the leave-page prompt still protects the draft */
      }
    };
    const timer = window.setTimeout(write, 250);
    window.addEventListener("pagehide", write);
    return () => {
      window.clearTimeout(timer);
      window.removeEventListener("pagehide", write);
    };
  }, [recipeId, draft, dirty, enabled]);

  useEffect(() => {
    if (!enabled || !dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = "";
    };
    // Links inside the app change pages without unloading: ask on those too.
    const onClick = (e: MouseEvent) => {
      const a = (e.target as Element | null)?.closest?.("a[href]") as HTMLAnchorElement | null;
      if (!a || a.target === "_blank" || e.defaultPrevented || e.button !== 0 || e.metaKey || e.ctrlKey) return;
      const url = new URL(a.href, window.location.href);
      if (url.origin !== window.location.origin || url.pathname === window.location.pathname) return;
      if (!window.confirm("Leave the bench? Your draft is not saved as a version yet (this browser keeps it for when you come back).")) {
        e.preventDefault();
        e.stopPropagation();
      }
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    document.addEventListener("click", onClick, true);
    return () => {
      window.removeEventListener("beforeunload", onBeforeUnload);
      document.removeEventListener("click", onClick, true);
    };
  }, [enabled, dirty]);
}
