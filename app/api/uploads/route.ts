import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { putObject } from "@/lib/storage";
import { checkUpload, randomStorageKey, readUploadForm } from "@/lib/uploads";
import { sha256Hex } from "@/lib/sha256";
import { findItem, findModel } from "@/db/kit";
import { insertUpload } from "@/db/uploads";
import { findSite } from "@/db/sites";
import { isUuid } from "@/lib/validations/ids";

/** Photos of an item, a model or a site, and manuals (PDF) of a model. Traces go through the slip bench. */
export const POST = crewRoute("kit.write", async ({ crew, user }, request) => {
  const purposeField = request.nextUrl.searchParams.get("purpose");
  if (purposeField !== "photo" && purposeField !== "manual") {
    throw new RequestError(400, "Say what the file is with ?purpose=photo or ?purpose=manual (traces are uploaded on the Slip bench).");
  }
  const purpose = purposeField;
  const { form, file, bytes } = await readUploadForm(request, purpose);
  const [itemId, modelId, siteId] = ["itemId", "modelId", "siteId"].map((key) => form.get(key));
  const owner =
    typeof itemId === "string" && itemId !== ""
      ? { itemId: isUuid(itemId) && (await findItem(crew.id, itemId)) ? itemId : null }
      : typeof siteId === "string" && siteId !== ""
        ? { siteId: isUuid(siteId) && (await findSite(crew.id, siteId)) ? siteId : null }
        : { modelId: isUuid(modelId) && (await findModel(crew.id, modelId)) ? modelId : null };
  if (!Object.values(owner)[0]) throw new RequestError(404, "Attach the file to an item, a gear model or a site of this crew (itemId, modelId or siteId).");
  if (purpose === "manual" && !("modelId" in owner)) throw new RequestError(400, "Manuals belong to a gear model: send modelId.");
  const contentType = await checkUpload(purpose, file.name, bytes);
  const sha256 = sha256Hex(bytes);
  const storageKey = randomStorageKey();
  await putObject(storageKey, bytes, contentType, sha256);
  const upload = await insertUpload(crew.id, {
    purpose,
    storageKey,
    fileName: file.name,
    contentType,
    byteSize: bytes.byteLength,
    sha256,
    ...owner,
    uploadedBy: user.id,
  });
  return NextResponse.json({ upload }, { status: 201 });
});
