import crypto from "node:crypto";
import { RequestError } from "./http-errors";
import { mebibytes, NUL_REFUSAL, readBodyBytes } from "./request-body";

// What may be uploaded, how large, and how its type is told from its first bytes as well as its name.

export const UPLOAD_PURPOSES = ["trace", "photo", "manual"] as const;
export type UploadPurpose = (typeof UPLOAD_PURPOSES)[number];

const MiB = 1024 * 1024;
/** A 1,000,000-row trace is about 20 MiB of CSV; photos from a phone stay under 15 MiB. */
export const UPLOAD_LIMITS: Record<UploadPurpose, number> = { trace: 64 * MiB, photo: 15 * MiB, manual: 30 * MiB };

const ALLOWED: Record<UploadPurpose, string> = {
  trace: "a CSV text file (.csv or .txt)",
  photo: "a JPEG, PNG or WebP image (.jpg, .jpeg, .png, .webp)",
  manual: "a PDF document (.pdf)",
};

interface FileType {
  contentType: string;
  extensions: string[];
  matches: (head: Uint8Array) => boolean;
}

const startsWith = (head: Uint8Array, bytes: number[], at = 0) => bytes.every((b, i) => head[at + i] === b);
const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));

// Signatures: PNG (ISO/IEC 15948), JPEG SOI marker (ISO/IEC 10918-1), WebP RIFF container (RFC 9649, cited from memory), PDF header (ISO 32000).
const TYPES: Record<UploadPurpose, FileType[]> = {
  photo: [
    { contentType: "image/png", extensions: [".png"], matches: (h) => startsWith(h, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]) },
    { contentType: "image/jpeg", extensions: [".jpg", ".jpeg"], matches: (h) => startsWith(h, [0xff, 0xd8, 0xff]) },
    { contentType: "image/webp", extensions: [".webp"], matches: (h) => startsWith(h, ascii("RIFF")) && startsWith(h, ascii("WEBP"), 8) },
  ],
  manual: [{ contentType: "application/pdf", extensions: [".pdf"], matches: (h) => startsWith(h, ascii("%PDF-")) }],
  trace: [{ contentType: "text/csv", extensions: [".csv", ".txt"], matches: isText }],
};

/** Text as a CSV is: valid UTF-8 with no NUL bytes in the first 64 KiB. */
function isText(head: Uint8Array): boolean {
  const sample = head.subarray(0, 64 * 1024);
  if (sample.includes(0)) return false;
  try {
    // A multi-byte character cut at the sample's end is not an error: decode in streaming mode.
    new TextDecoder("utf-8", { fatal: true }).decode(sample, { stream: true });
    return true;
  } catch {
    return false;
  }
}

const extensionOf = (fileName: string) => {
  const dot = fileName.lastIndexOf(".");
  return dot < 0 ? "" : fileName.slice(dot).toLowerCase();
};

function typeByName(purpose: UploadPurpose, fileName: string): FileType {
  const extension = extensionOf(fileName);
  const byName = TYPES[purpose].find((t) => t.extensions.includes(extension));
  if (!byName) throw new RequestError(415, `"${fileName}" is not ${ALLOWED[purpose]}: its name does not end in one of those extensions.`);
  return byName;
}

const renamed = (purpose: UploadPurpose, fileName: string) =>
  new RequestError(415, `"${fileName}" is named like ${ALLOWED[purpose]}, but its contents are not: upload the file itself, not a renamed one.`);

/** The content type the file really is, when both its name and its first bytes agree; else a 415 saying what is allowed. */
export function checkFileType(purpose: UploadPurpose, fileName: string, bytes: Uint8Array): string {
  const byName = typeByName(purpose, fileName);
  if (!byName.matches(bytes)) throw renamed(purpose, fileName);
  return byName.contentType;
}

/** A trace's content type and its whole text, decoded once: named as a CSV, no NUL byte, UTF-8 throughout; else a 415. */
export function traceText(fileName: string, bytes: Uint8Array): { contentType: string; text: string } {
  const byName = typeByName("trace", fileName);
  if (bytes.includes(0)) throw renamed("trace", fileName);
  try {
    return { contentType: byName.contentType, text: new TextDecoder("utf-8", { fatal: true }).decode(bytes) };
  } catch {
    throw new RequestError(415, `"${fileName}" is not UTF-8 text: save the trace as a UTF-8 CSV.`);
  }
}

/**
 * A file's content type when it is what its name says and, for a photo, its pixels decode: a cut-short or
 * damaged image (libvips through sharp, failing on decode errors) is refused instead of showing as a broken picture.
 */
export async function checkUpload(purpose: UploadPurpose, fileName: string, bytes: Uint8Array): Promise<string> {
  const contentType = checkFileType(purpose, fileName, bytes);
  if (purpose === "photo") {
    const { default: sharp } = await import("sharp");
    try {
      await sharp(bytes, { failOn: "error" }).stats();
    } catch {
      throw new RequestError(
        415,
        `"${fileName}" is a damaged image: its picture cannot be read, perhaps because the file was cut short. Upload it again from the camera or phone.`,
      );
    }
  }
  return contentType;
}

export function checkFileSize(purpose: UploadPurpose, fileName: string, size: number): void {
  if (size === 0) throw new RequestError(400, `"${fileName}" is empty.`);
  if (size > UPLOAD_LIMITS[purpose]) {
    throw new RequestError(413, `"${fileName}" is ${(size / MiB).toFixed(1)} MiB; ${purpose} files may be at most ${UPLOAD_LIMITS[purpose] / MiB} MiB.`);
  }
}

const tooLargeUpload = (purpose: UploadPurpose) => (size: number) =>
  new RequestError(413, `The upload is ${mebibytes(size)} or more; ${purpose} files may be at most ${UPLOAD_LIMITS[purpose] / MiB} MiB.`);

/** Reads the multipart form of an upload, no more bytes than the purpose allows (announced or not), answering 400 (not 500) when it is not one. */
export async function readUploadForm(request: Request, purpose: UploadPurpose): Promise<{ form: FormData; file: File; bytes: Uint8Array }> {
  // Room for the multipart framing and the form's other fields.
  const body = await readBodyBytes(request, UPLOAD_LIMITS[purpose] + 64 * 1024, tooLargeUpload(purpose));
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": request.headers.get("content-type") ?? "" } }).formData();
  } catch {
    throw new RequestError(400, 'The upload must be sent as multipart/form-data with the file in a field named "file".');
  }
  const file = form.get("file");
  if (!(file instanceof File)) throw new RequestError(400, 'Choose a file to upload (the form field "file" is missing).');
  if ([...form.keys()].some((key) => key.includes("\u0000")) || [...form.values()].some((v) => (typeof v === "string" ? v : v.name).includes("\u0000"))) {
    throw new RequestError(400, NUL_REFUSAL);
  }
  checkFileSize(purpose, file.name, file.size);
  return { form, file, bytes: new Uint8Array(await file.arrayBuffer()) };
}

/** A storage key that says nothing about the crew or the file and cannot be guessed. */
export const randomStorageKey = () => `uploads/${crypto.randomBytes(24).toString("hex")}`;
