import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { ImportWorkspaceForm } from "@/components/workspace-transfer/import-form";
import { requireViewer } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { MAX_IMPORT_BYTES } from "@/lib/workspace-transfer/format";

export const metadata: Metadata = { title: "Workspace" };

/** Owner-only: download the whole workspace as one file, or make a new workspace from such a file. */
export default async function WorkspaceSettingsPage() {
  const viewer = await requireViewer();
  if (!can(viewer.role, "workspace.export")) notFound();
  return (
    <div className="space-y-8">
      <div>
        <h1 className="text-3xl font-bold">Workspace</h1>
        <p className="mt-2 text-cocoa-700">Settings of {viewer.workspace.name} that only owners can change.</p>
      </div>
      <Card data-testid="backup-and-move">
        <CardHeader
          title="Backup and move"
          description="Keep a copy of everything in this workspace, or carry it to another Barwright server."
        />
        <div className="space-y-6 text-sm text-cocoa-700">
          <section className="space-y-3">
            <h3 className="text-base font-semibold text-cocoa">Download this workspace</h3>
            <p>
              One JSON file with every supplier, ingredient, quote, recipe and version, bean lot, batch, run, order and
              cost setting, and the files attached to them. People are listed by name, e-mail and role; passwords and
              sign-ins never leave the server. Keep the file somewhere safe: it holds your prices and recipes.
            </p>
            <div className="flex flex-wrap gap-3">
              <Button asChild>
                <a href="/api/workspace/export?files=include" download data-testid="export-with-files">
                  Download with files
                </a>
              </Button>
              <Button asChild variant="secondary">
                <a href="/api/workspace/export?files=reference" download data-testid="export-without-files">
                  Download without files
                </a>
              </Button>
            </div>
            <p className="text-cocoa-500">
              Without files, the download is smaller and names each file by its checksum instead of carrying it; it can
              only be imported on this server, by an owner of this workspace.
            </p>
          </section>
          <section className="space-y-3 border-t border-sand-light pt-6">
            <h3 className="text-base font-semibold text-cocoa">Import a workspace</h3>
            <p>
              Importing makes a <strong>new</strong> workspace, named after the one in the file with today&apos;s date;
              nothing here changes. You become its owner and only member; the other people in the file are listed so you
              can invite them. A file that is damaged, edited or from a newer Barwright is refused whole, with the reason.
            </p>
            <ImportWorkspaceForm maxMegabytes={MAX_IMPORT_BYTES / (1024 * 1024)} />
          </section>
        </div>
      </Card>
    </div>
  );
}
