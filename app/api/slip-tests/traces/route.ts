import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { putObject } from "@/lib/storage";
import { randomStorageKey, readUploadForm } from "@/lib/uploads";
import { offThread } from "@/lib/worker-pool";
import { TraceOptionsSchema } from "@/lib/validations/slip-tests";
import { insertUpload } from "@/db/uploads";
import { toNewtons } from "@/physics";

/**
 * Receives a load-cell trace, parses it, runs the engine's slip detection (on a worker thread) and keeps the file with its
 * analysis. Nothing is stored unless the whole trace parses: the tester then confirms or corrects the value.
 */
export const POST = crewRoute("slip.write", async ({ crew, user }, request) => {
  const { form, file, bytes } = await readUploadForm(request, "trace");
  const numberField = (name: string) => {
    const raw = form.get(name);
    return typeof raw === "string" && raw.trim() !== "" ? Number(raw.replace(",", ".")) : undefined;
  };
  const options = TraceOptionsSchema.parse({ unit: form.get("unit") ?? undefined, drop: numberField("drop"), pullEndS: numberField("pullEndS") });
  const job = { fileName: file.name, bytes, unit: options.unit, dropN: toNewtons(options.drop, options.unit), pullEndS: options.pullEndS };
  const { contentType, analysis, sha256, bytes: stored } = await offThread("analyseTrace", job, [bytes.buffer as ArrayBuffer]);
  const storageKey = randomStorageKey();
  await putObject(storageKey, stored, contentType, sha256);
  const upload = await insertUpload(crew.id, {
    purpose: "trace",
    storageKey,
    fileName: file.name,
    contentType,
    byteSize: stored.byteLength,
    sha256,
    analysis,
    uploadedBy: user.id,
  });
  return NextResponse.json({ upload: { id: upload.id, fileName: upload.fileName, sha256 }, analysis }, { status: 201 });
});
