"use client";

import * as Slider from "@radix-ui/react-slider";
import { memo, useState, type KeyboardEvent } from "react";
import { flushSync } from "react-dom";
import { cn } from "@/lib/cn";
import { RESOLUTION, RESOLUTION_DECIMALS } from "./bench-state";
import { markInput } from "./paint-probe";

export type SliderRowProps = {
  index: number;
  name: string;
  percent: string;
  locked: boolean;
  /** Read-only bench: nothing moves. */
  readOnly?: boolean;
  note?: string;
  onPercent: (index: number, percent: string) => void;
  onToggleLock: (index: number) => void;
  onRemove: (index: number) => void;
};

const PERCENT_TEXT = /^\d{1,3}(\.\d{1,4})?$/;

/**
 * One line of the bench: a slider (arrow keys ±0.1 %, Shift+arrow ±1 %, Home/End
 * to the ends, all through Radix) and an exact number field side by side, a lock
 * and a remove button. Every change goes to the bench, which rebalances.
 */
export const SliderRow = memo(function SliderRow({ index, name, percent, locked, readOnly, note, onPercent, onToggleLock, onRemove }: SliderRowProps) {
  const value = Number(percent);
  const shown = value.toFixed(RESOLUTION_DECIMALS);
  const [text, setText] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const fixed = locked || readOnly;
  const fieldId = `line-${index}-percent`;

  function commit() {
    if (text === null) return;
    const t = text.trim().replace(",", ".");
    if (!PERCENT_TEXT.test(t) || Number(t) > 100) {
      setError("Enter a percent from 0 to 100.");
      return;
    }
    setError(null);
    setText(null);
    if (t !== percent) onPercent(index, t);
  }

  function onKeyDown(e: KeyboardEvent<HTMLInputElement>) {
    if (e.key === "Enter") commit();
    if (e.key === "Escape") {
      setText(null);
      setError(null);
    }
  }

  return (
    // On a phone the name takes its own row, so the slider keeps room to drag.
    <li className="grid grid-cols-[minmax(0,1fr)_6rem_auto] items-center gap-x-3 gap-y-1 py-2 sm:grid-cols-[minmax(9rem,14rem)_1fr_7rem_auto] sm:gap-y-3" data-testid={`line-${index}`}>
      <div className="col-span-3 min-w-0 sm:col-span-1">
        <p className="truncate font-semibold" title={name}>
          {name}
        </p>
        {note ? <p className="text-xs text-cocoa-500">{note}</p> : null}
      </div>
      <Slider.Root
        className={cn("relative flex h-6 touch-none select-none items-center", fixed && "opacity-60")}
        value={[value]}
        min={0}
        max={100}
        step={Number(RESOLUTION)}
        disabled={fixed}
        onValueChange={([v]) => {
          markInput();
          if (v === undefined) return;
          // A drag's pointer moves come once a frame, just before it is drawn: rendering now (not
          // in a later task) puts the new figures in that same frame.
          flushSync(() => onPercent(index, v.toFixed(RESOLUTION_DECIMALS)));
        }}
      >
        <Slider.Track className="relative h-2 grow rounded-full bg-sand-light">
          <Slider.Range className="absolute h-full rounded-full bg-pod" />
        </Slider.Track>
        <Slider.Thumb
          aria-label={name}
          aria-valuetext={`${shown} %`}
          className="block size-5 rounded-full border-2 border-pod bg-white shadow focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-pod"
        />
      </Slider.Root>
      <div>
        <div className="relative">
          <input
            id={fieldId}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            aria-label={`${name}, exact percent`}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${fieldId}-error` : undefined}
            disabled={fixed}
            value={text ?? shown}
            onChange={(e) => setText(e.target.value)}
            onBlur={commit}
            onKeyDown={onKeyDown}
            className="figures h-9 w-full rounded-lg border border-sand bg-white pl-2 pr-7 text-right focus:border-pod focus:outline-none focus:ring-2 focus:ring-pod/30 disabled:bg-cream-deep aria-[invalid=true]:border-brick"
          />
          <span className="pointer-events-none absolute inset-y-0 right-2 flex items-center text-sm text-cocoa-500">%</span>
        </div>
        {error ? (
          <p id={`${fieldId}-error`} role="alert" className="mt-1 text-xs text-brick">
            {error}
          </p>
        ) : null}
      </div>
      {readOnly ? (
        <span />
      ) : (
        <div className="flex gap-1">
          <button
            type="button"
            aria-pressed={locked}
            aria-label={`Lock ${name}`}
            title={locked ? "Locked: other moves leave it where it is" : "Lock this line"}
            onClick={() => onToggleLock(index)}
            className={cn("h-9 rounded-md px-2 text-sm font-semibold", locked ? "bg-cocoa text-cream" : "text-cocoa-700 hover:bg-cream-deep")}
          >
            {locked ? "Locked" : "Lock"}
          </button>
          <button
            type="button"
            aria-label={`Remove ${name}`}
            onClick={() => onRemove(index)}
            className="h-9 rounded-md px-2 text-cocoa-500 hover:bg-brick-light hover:text-brick"
          >
            ×
          </button>
        </div>
      )}
    </li>
  );
});
