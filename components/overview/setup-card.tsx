import Link from "next/link";
import { Card, CardHeader } from "@/components/ui/card";
import { cn } from "@/lib/cn";
import type { SetupProgress, SetupStep } from "@/lib/data/overview";

const STEPS: Record<SetupStep, { label: string; hint: string; href: string }> = {
  supplier: { label: "Add your suppliers", hint: "Beans, cocoa butter, sugar, milk powder: who you buy from.", href: "/suppliers/new" },
  quote: { label: "Enter their prices", hint: "Type a quote on an ingredient's page, or upload a supplier's price list.", href: "/prices/upload" },
  recipe: { label: "Save a first recipe", hint: "Start from a dark, milk or white bar and tune it on the bench.", href: "/recipes/new" },
  release: { label: "Release a version", hint: "Production works from released versions only. Release one from the recipe's history.", href: "/recipes" },
  lot: { label: "Record a bean lot", hint: "Its sorting, roasting and winnowing give what a kilo of nibs really costs.", href: "/lots/new" },
  batch: { label: "Plan a batch", hint: "A released version at any mass, split into machine loads, with its batch sheet.", href: "/batches/new" },
  team: { label: "Invite your team", hint: "A formulator, a buyer, production staff — each with their role.", href: "/settings/members" },
};

/** The owner's first steps in a new workspace, each ticked once the workspace holds it. Gone once all are done. */
export function SetupCard({ setup }: { setup: SetupProgress }) {
  const left = setup.filter((s) => !s.done).length;
  return (
    <Card data-testid="overview-setup" className="lg:col-span-2">
      <CardHeader title="Getting started" description={`${setup.length - left} of ${setup.length} done. This list goes away once every step is.`} />
      <ol className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-2">
        {setup.map(({ step, done }, i) => (
          <li key={step} className="flex gap-3" data-testid={`setup-${step}`} data-done={done}>
            <span
              aria-hidden
              className={cn(
                "mt-0.5 flex size-6 shrink-0 items-center justify-center rounded-full text-xs font-bold",
                done ? "bg-sage-light text-sage" : "bg-pod-light text-pod-dark",
              )}
            >
              {done ? "✓" : i + 1}
            </span>
            <span>
              {done ? (
                <span className="font-semibold text-cocoa-500 line-through decoration-cocoa-300">{STEPS[step].label}</span>
              ) : (
                <Link href={STEPS[step].href} className="font-semibold text-pod-dark hover:underline">
                  {STEPS[step].label}
                </Link>
              )}
              <span className="sr-only">{done ? " (done)" : " (to do)"}</span>
              <span className="block text-cocoa-500">{STEPS[step].hint}</span>
            </span>
          </li>
        ))}
      </ol>
    </Card>
  );
}
