import Link from "next/link";
import { Button } from "@/components/ui/button";

/** The label as files, printed on the server from the print page, and the print page itself. */
export function LabelDownloads({ recipeId, versionNo }: { recipeId: string; versionNo: number }) {
  const file = (format: "pdf" | "png", paper = "a4") => `/api/labels/${recipeId}?version=${versionNo}&format=${format}&paper=${paper}`;
  return (
    <div className="flex flex-wrap gap-2" data-testid="label-downloads">
      <Button asChild variant="secondary" size="sm">
        <a href={file("pdf")} download>PDF (A4)</a>
      </Button>
      <Button asChild variant="secondary" size="sm">
        <a href={file("pdf", "letter")} download>PDF (Letter)</a>
      </Button>
      <Button asChild variant="secondary" size="sm">
        <a href={file("png")} download>PNG</a>
      </Button>
      <Button asChild variant="quiet" size="sm">
        <Link href={`/print/labels/${recipeId}?version=${versionNo}`} target="_blank">
          Printable page
        </Link>
      </Button>
    </div>
  );
}
