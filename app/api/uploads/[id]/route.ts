import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { deleteObject, getObjectStream } from "@/lib/storage";
import { rowId } from "@/lib/validations/ids";
import { deleteUpload, findUpload } from "@/db/uploads";
import { NextResponse } from "next/server";

/**
 * A crew's own file, streamed from S3; another crew's answers 404. Served sandboxed and never sniffed, so an
 * uploaded file that is really a page or a script cannot run as one of ours.
 */
export const GET = crewRoute<{ id: string }>("kit.read", async ({ crew }, _request, { id }) => {
  const upload = await findUpload(crew.id, rowId(id, "file"));
  if (!upload) throw new RequestError(404, "No such file in this crew.");
  const body = await getObjectStream(upload.storageKey);
  // The demo seed's traces keep only their analysis when seeding ran without a bucket.
  if (!body)
    throw new RequestError(404, `The bytes of "${upload.fileName}" are not in storage; its recorded analysis is kept. Upload the file again to keep a copy.`);
  const disposition = upload.purpose === "trace" ? "attachment" : "inline";
  return new Response(body, {
    headers: {
      "content-type": upload.contentType,
      "content-length": String(upload.byteSize),
      "content-disposition": `${disposition}; filename="${upload.fileName.replace(/[^\w.\- ]/g, "_")}"`,
      "content-security-policy": "sandbox",
      "x-content-type-options": "nosniff",
      "cache-control": "private, max-age=3600",
      "x-sha256": upload.sha256,
    },
  });
});

/** Removes a photo or a manual of the crew's Kit: its record first, then its bytes. A slip test's trace stays with the test. */
export const DELETE = crewRoute<{ id: string }>("kit.write", async ({ crew }, _request, { id }) => {
  const removed = await deleteUpload(crew.id, rowId(id, "file"));
  if (!removed) throw new RequestError(404, "No such file in this crew.");
  if (removed === "trace") throw new RequestError(409, "A load-cell trace is the record of its slip test and stays with it.");
  // The record is gone, so nobody reaches the bytes any more; a store that fails to drop them leaves only unreachable bytes.
  await deleteObject(removed.storageKey).catch((error) => console.error(`uploads: ${removed.storageKey} stays in storage:`, error));
  return NextResponse.json({ removed: removed.id });
});
