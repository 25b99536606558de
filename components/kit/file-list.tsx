import type { UploadRow } from "@/db/uploads";
import { RemoveFileButton } from "./remove-file-button";

/** Photos as thumbnails and manuals as links, each served only to this crew through /api/uploads; a rigger may remove them. */
export function FileList({ files, removable }: { files: UploadRow[]; removable: boolean }) {
  if (files.length === 0) return <p className="text-ink-600">No files yet.</p>;
  return (
    <ul className="flex flex-wrap gap-4">
      {files.map((f) => (
        <li key={f.id} className="w-44 rounded-panel border border-ink-200 bg-white p-2 text-sm">
          <a href={`/api/uploads/${f.id}`} target="_blank" rel="noreferrer" className="block">
            {f.purpose === "photo" ? (
              // eslint-disable-next-line @next/next/no-img-element -- a crew's private file, not a static asset for the image optimiser
              <img src={`/api/uploads/${f.id}`} alt={`Photo ${f.fileName}`} className="h-32 w-full rounded-control object-cover" />
            ) : (
              <span className="flex h-32 items-center justify-center rounded-control bg-ink-100 font-semibold">PDF manual</span>
            )}
            <span className="mt-1 block truncate">{f.fileName}</span>
          </a>
          <span className="block text-xs text-ink-500">
            {(f.byteSize / 1024).toFixed(0)} KiB · SHA-256 {f.sha256.slice(0, 12)}…
          </span>
          {removable ? (
            <div className="mt-2">
              <RemoveFileButton id={f.id} fileName={f.fileName} />
            </div>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
