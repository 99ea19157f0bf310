"use client";

import { useCallback, useMemo, useSyncExternalStore } from "react";
import { AUTHORITIES, type Authority } from "@/lib/formulation";

const KEY = "barwright:authorities";
const EVENT = "barwright:authorities";

function read(): string | null {
  try {
    return window.localStorage.getItem(KEY);
  } catch {
    return null;
  }
}

function parse(raw: string | null): Authority[] {
  try {
    const parsed = raw ? (JSON.parse(raw) as unknown) : null;
    if (Array.isArray(parsed)) return AUTHORITIES.filter((a) => parsed.includes(a));
  } catch {
    /* a damaged value: all three */
  }
  return [...AUTHORITIES];
}

function subscribe(onChange: () => void): () => void {
  window.addEventListener(EVENT, onChange);
  window.addEventListener("storage", onChange);
  return () => {
    window.removeEventListener(EVENT, onChange);
    window.removeEventListener("storage", onChange);
  };
}

/** The authorities the standards panel shows, remembered in this browser (all three at first). */
export function useChosenAuthorities(): [Authority[], (chosen: Authority[]) => void] {
  const raw = useSyncExternalStore(subscribe, read, () => null);
  const chosen = useMemo(() => parse(raw), [raw]);
  const choose = useCallback((next: Authority[]) => {
    try {
      window.localStorage.setItem(KEY, JSON.stringify(next));
    } catch {
      /* not remembered, still applied below */
    }
    window.dispatchEvent(new Event(EVENT));
  }, []);
  return [chosen, choose];
}
