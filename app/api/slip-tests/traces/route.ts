import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { putObject } from "@/lib/storage";
import { analyseTrace } from "@/lib/trace-analysis";
import { parseTraceCsv } from "@/lib/trace-csv";
import { randomStorageKey, readUploadForm, traceText } from "@/lib/uploads";
import { sha256Hex } from "@/lib/sha256";
import { TraceOptionsSchema } from "@/lib/validations/slip-tests";
import { insertUpload } from "@/db/uploads";
import { toNewtons } from "@/physics";

/**
 * Receives a load-cell trace, parses it, runs the engine's slip detection and keeps the file with its
 * analysis. Nothing is stored unless the whole trace parses: the tester then confirms or corrects the value.
 */
export const POST = crewRoute("slip.write", async ({ crew, user }, request) => {
  const { form, file, bytes } = await readUploadForm(request, "trace");
  const numberField = (name: string) => {
    const raw = form.get(name);
    return typeof raw === "string" && raw.trim() !== "" ? Number(raw.replace(",", ".")) : undefined;
  };
  const options = TraceOptionsSchema.parse({ unit: form.get("unit") ?? undefined, drop: numberField("drop"), pullEndS: numberField("pullEndS") });
  const { contentType, text } = traceText(file.name, bytes);
  const analysis = analyseTrace(parseTraceCsv(text, options.unit), options.unit, toNewtons(options.drop, options.unit), options.pullEndS);
  const sha256 = sha256Hex(bytes);
  const storageKey = randomStorageKey();
  await putObject(storageKey, bytes, contentType, sha256);
  const upload = await insertUpload(crew.id, {
    purpose: "trace",
    storageKey,
    fileName: file.name,
    contentType,
    byteSize: bytes.byteLength,
    sha256,
    analysis,
    uploadedBy: user.id,
  });
  return NextResponse.json({ upload: { id: upload.id, fileName: upload.fileName, sha256 }, analysis }, { status: 201 });
});
