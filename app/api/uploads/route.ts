import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { putObject } from "@/lib/storage";
import { checkFileType, randomStorageKey, readUploadForm, sha256Hex } from "@/lib/uploads";
import { findItem, findModel } from "@/db/kit";
import { insertUpload } from "@/db/uploads";
import { isUuid } from "@/lib/validations/ids";

/** Photos of an item or a model, and manuals (PDF) of a model. Traces go through the slip bench. */
export const POST = crewRoute("kit.write", async ({ crew, user }, request) => {
  const purposeField = request.nextUrl.searchParams.get("purpose");
  if (purposeField !== "photo" && purposeField !== "manual") {
    throw new RequestError(400, "Say what the file is with ?purpose=photo or ?purpose=manual (traces are uploaded on the Slip bench).");
  }
  const purpose = purposeField;
  const { form, file, bytes } = await readUploadForm(request, purpose);
  const itemId = form.get("itemId");
  const modelId = form.get("modelId");
  const owner =
    typeof itemId === "string" && itemId !== ""
      ? { itemId: isUuid(itemId) && (await findItem(crew.id, itemId)) ? itemId : null }
      : { modelId: isUuid(modelId) && (await findModel(crew.id, modelId)) ? modelId : null };
  if (!owner.itemId && !owner.modelId) throw new RequestError(404, "Attach the file to an item or a gear model of this crew (itemId or modelId).");
  if (purpose === "manual" && owner.itemId) throw new RequestError(400, "Manuals belong to a gear model, not to one item: send modelId.");
  const contentType = checkFileType(purpose, file.name, bytes);
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
