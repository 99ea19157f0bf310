/** Shown instead of a form the viewer's role may not use (a refusal, not a failure). */
export function NotAllowed({ what, who }: { what: string; who: string }) {
  return (
    <div role="note" className="rounded-card border border-sand bg-cream-deep p-6">
      <h2 className="text-lg font-bold">Your role cannot {what}</h2>
      <p className="mt-1 text-cocoa-700">{who} can. Ask an owner of the workspace if you need to.</p>
    </div>
  );
}
