import Link from "next/link";
import { Button } from "@/components/ui/button";

const jobs = [
  {
    who: "The chocolatier",
    title: "Tune a recipe and know what is in it",
    body: "Move a slider and watch total dry cocoa solids, cocoa butter, fat-free cocoa solids, milk solids, milk fat and sugar settle — and whether the bar meets EU Directive 2000/36/EC, US 21 CFR 163 and Codex CXS 87-1981 for the name you want to print. Every saved version is kept.",
  },
  {
    who: "The buyer",
    title: "Cost a bar to the cent",
    body: "Compare what each supplier's beans, cocoa butter, sugar and milk powder make a bar cost, and what a kilo of nibs really costs once sorting, roasting and winnowing losses are counted.",
  },
  {
    who: "Production",
    title: "Print a batch sheet that adds up",
    body: "Scale a released recipe from a 10 kg stone refiner to tonnes, split into machine loads, with masses that sum exactly to the batch and a line for every lot code.",
  },
  {
    who: "The owner",
    title: "Margins, people and records",
    body: "Who may change a recipe and who may only read it, what each bar earns, and the records an inspector or a customer asks for.",
  },
];

export default function LandingPage() {
  return (
    <div className="mx-auto max-w-page px-gutter">
      <section className="grid gap-10 py-section md:grid-cols-[1.2fr_1fr] md:items-center">
        <div>
          <p className="text-sm font-semibold uppercase tracking-widest text-pod-dark">For bean-to-bar makers</p>
          <h1 className="mt-3 text-4xl font-bold leading-tight md:text-5xl">
            From bean lot to bar label, with the arithmetic done right.
          </h1>
          <p className="mt-5 max-w-xl text-lg text-cocoa-700">
            Barwright keeps your recipes, costs and batch sheets in one place. It computes composition exactly, checks
            the legal minimums, and never loses a version.
          </p>
          <div className="mt-8 flex gap-3">
            <Button asChild size="lg">
              <Link href="/sign-in">Sign in to your workspace</Link>
            </Button>
          </div>
        </div>
        <figure className="rounded-card border border-sand bg-white p-6 shadow-card" aria-label="Example composition">
          <figcaption className="text-sm font-semibold text-cocoa-500">A 70 % dark bar, per 100 g</figcaption>
          <dl className="figures mt-4 space-y-2 text-[0.95rem]">
            {[
              ["Total dry cocoa solids", "70.0 g"],
              ["of which cocoa butter", "41.9 g"],
              ["of which fat-free cocoa solids", "28.1 g"],
              ["Sugar", "29.6 g"],
              ["Lecithin", "0.4 g"],
            ].map(([k, v]) => (
              <div key={k} className="flex justify-between border-b border-sand-light pb-2">
                <dt>{k}</dt>
                <dd className="font-semibold">{v}</dd>
              </div>
            ))}
          </dl>
          <p className="mt-4 text-xs text-cocoa-500">Illustrative figures.</p>
        </figure>
      </section>
      <section className="grid gap-6 pb-section md:grid-cols-2" aria-label="What Barwright does">
        {jobs.map((j) => (
          <article key={j.who} className="rounded-card border border-sand bg-cream-deep/60 p-6">
            <p className="text-xs font-semibold uppercase tracking-widest text-pod-dark">{j.who}</p>
            <h2 className="mt-2 text-xl font-bold">{j.title}</h2>
            <p className="mt-2 text-cocoa-700">{j.body}</p>
          </article>
        ))}
      </section>
    </div>
  );
}
