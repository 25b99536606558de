import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { getObjectStream } from "@/lib/storage";
import { rowId } from "@/lib/validations/ids";
import { findUpload } from "@/db/uploads";

/** A crew's own file, streamed from S3; another crew's answers 404. */
export const GET = crewRoute<{ id: string }>("kit.read", async ({ crew }, _request, { id }) => {
  const upload = await findUpload(crew.id, rowId(id, "file"));
  if (!upload) throw new RequestError(404, "No such file in this crew.");
  const disposition = upload.purpose === "trace" ? "attachment" : "inline";
  return new Response(await getObjectStream(upload.storageKey), {
    headers: {
      "content-type": upload.contentType,
      "content-length": String(upload.byteSize),
      "content-disposition": `${disposition}; filename="${upload.fileName.replace(/[^\w.\- ]/g, "_")}"`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, max-age=3600",
      "x-sha256": upload.sha256,
    },
  });
});
