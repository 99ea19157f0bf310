"use client";

import * as ToastPrimitive from "@radix-ui/react-toast";
import { createContext, useCallback, useContext, useState, type ReactNode } from "react";
import { cn } from "@/lib/cn";

type Toast = { id: number; title: string; description?: string; tone: "info" | "success" | "error" };
type ShowToast = (t: Omit<Toast, "id" | "tone"> & { tone?: Toast["tone"] }) => void;

const ToastContext = createContext<ShowToast | null>(null);

const toneClass = {
  info: "border-sand",
  success: "border-sage",
  error: "border-brick",
} as const;

/** Provides `useToast()`; renders Radix toasts in the bottom-right corner. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const show = useCallback<ShowToast>((t) => {
    setToasts((list) => [...list, { id: Date.now() + Math.random(), tone: "info", ...t }]);
  }, []);
  return (
    <ToastContext.Provider value={show}>
      <ToastPrimitive.Provider swipeDirection="right" duration={5000}>
        {children}
        {toasts.map((t) => (
          <ToastPrimitive.Root
            key={t.id}
            onOpenChange={(open) => {
              if (!open) setToasts((list) => list.filter((x) => x.id !== t.id));
            }}
            className={cn("rounded-lg border-l-4 bg-white p-4 shadow-card", toneClass[t.tone])}
          >
            <ToastPrimitive.Title className="font-semibold">{t.title}</ToastPrimitive.Title>
            {t.description ? (
              <ToastPrimitive.Description className="mt-1 text-sm text-cocoa-500">{t.description}</ToastPrimitive.Description>
            ) : null}
          </ToastPrimitive.Root>
        ))}
        <ToastPrimitive.Viewport className="fixed bottom-4 right-4 z-50 flex w-80 flex-col gap-2" />
      </ToastPrimitive.Provider>
    </ToastContext.Provider>
  );
}

export function useToast(): ShowToast {
  const show = useContext(ToastContext);
  if (!show) throw new Error("useToast must be used inside <ToastProvider>");
  return show;
}
