import "server-only";
import { db } from "./knex";
import type { UploadPurpose } from "@/lib/uploads";

// Uploaded files' metadata; the bytes are in S3 under storage_key.

/** An upload as pages and answers show it: never its storage key, which names the bytes in the bucket. */
export interface UploadRow {
  id: string;
  purpose: UploadPurpose;
  fileName: string;
  contentType: string;
  byteSize: number;
  sha256: string;
  modelId: string | null;
  itemId: string | null;
  createdAt: string;
}

/** An upload with the key of its bytes in S3, for the server alone (download and removal). */
export type StoredUpload = UploadRow & { storageKey: string };

/** What a photo or manual belongs to. */
export type UploadOwner = { itemId: string } | { modelId: string } | { siteId: string };

export type NewUpload = Omit<StoredUpload, "id" | "createdAt" | "modelId" | "itemId"> & {
  modelId?: string | null;
  itemId?: string | null;
  siteId?: string | null;
  analysis?: unknown;
  uploadedBy: string;
};

const columns = [
  "id",
  "purpose",
  db.raw('file_name as "fileName"'),
  db.raw('content_type as "contentType"'),
  db.raw('byte_size::float8 as "byteSize"'),
  "sha256",
  db.raw('model_id as "modelId"'),
  db.raw('item_id as "itemId"'),
  db.raw('created_at as "createdAt"'),
];

export async function insertUpload(crewId: string, upload: NewUpload): Promise<UploadRow> {
  const [{ id }] = await db("uploads")
    .insert({
      crew_id: crewId,
      purpose: upload.purpose,
      storage_key: upload.storageKey,
      file_name: upload.fileName,
      content_type: upload.contentType,
      byte_size: upload.byteSize,
      sha256: upload.sha256,
      model_id: upload.modelId ?? null,
      item_id: upload.itemId ?? null,
      site_id: upload.siteId ?? null,
      analysis: upload.analysis === undefined ? null : JSON.stringify(upload.analysis),
      uploaded_by: upload.uploadedBy,
    })
    .returning("id");
  return (await db("uploads").where({ crew_id: crewId, id }).first(columns))!;
}

export async function findUpload(crewId: string, id: string): Promise<StoredUpload | null> {
  return (
    (await db("uploads")
      .where({ crew_id: crewId, id })
      .first([...columns, db.raw('storage_key as "storageKey"')])) ?? null
  );
}

/** A trace's stored analysis (what the engine detected and the points the chart draws). */
export async function traceAnalysis<T>(crewId: string, id: string): Promise<T | null> {
  const row = await db("uploads").where({ crew_id: crewId, id, purpose: "trace" }).first("analysis");
  return (row?.analysis as T) ?? null;
}

export function listUploads(crewId: string, of: UploadOwner): Promise<UploadRow[]> {
  const where = "itemId" in of ? { item_id: of.itemId } : "siteId" in of ? { site_id: of.siteId } : { model_id: of.modelId };
  return db("uploads")
    .where({ crew_id: crewId, ...where })
    .orderBy("created_at", "desc")
    .select(columns);
}

/**
 * Removes a photo's or a manual's record and answers it, so its bytes can go from storage next. A trace is
 * kept: it is the evidence of a slip test, removed only with its crew.
 */
export async function deleteUpload(crewId: string, id: string): Promise<StoredUpload | null | "trace"> {
  const upload = await findUpload(crewId, id);
  if (!upload) return null;
  if (upload.purpose === "trace") return "trace";
  await db("uploads").where({ crew_id: crewId, id }).delete();
  return upload;
}
