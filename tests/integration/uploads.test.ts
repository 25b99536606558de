import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";

// A real 1×1 PNG (signature, IHDR, IDAT, IEND per ISO/IEC 15948), and a PDF header (ISO 32000-1 §7.5.2).
const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");
const PDF = Buffer.from("%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n");

let crew: FixtureCrew;
let other: FixtureCrew;
const as: Record<string, AppClient> = {};
let modelId: string;
let itemId: string;

function fileForm(bytes: Uint8Array, name: string, owner: Record<string, string>) {
  const form = new FormData();
  form.append("file", new Blob([bytes as BlobPart]), name);
  for (const [k, v] of Object.entries(owner)) form.append(k, v);
  return form;
}

// Both crews' uploads: a refused upload must be saved for neither, the caller's crew included.
const uploadCount = async () => Number((await testDb("uploads").whereIn("crew_id", [crew.id, other.id]).count<{ count: string }[]>({ count: "*" }))[0].count);

beforeAll(async () => {
  crew = await createCrew("uploads");
  other = await createCrew("uploads-other");
  as.rigger = await AppClient.signedIn(crew.people.rigger.email, crew.people.rigger.password);
  as.member = await AppClient.signedIn(crew.people.member.email, crew.people.member.password);
  as.outsider = await AppClient.signedIn(other.people.owner.email, other.people.owner.password);
  modelId = (await (await as.rigger.post("/api/kit/models", { kind: "sling", name: "Upload sling", specs: { mbsKN: 40 } })).json()).model.id;
  itemId = (await (await as.rigger.post("/api/kit/items", { modelId, label: "S-1", inServiceSince: "2026-01-01" })).json()).item.id;
});

afterAll(async () => {
  await testDb.destroy();
});

describe("photos and manuals", () => {
  it("stores a photo of an item with its SHA-256 under a random key and serves it back only to the crew", async () => {
    const response = await as.rigger.post("/api/uploads?purpose=photo", fileForm(PNG, "sling.png", { itemId }));
    expect(response.status).toBe(201);
    const { upload } = await response.json();
    expect(upload).toMatchObject({
      purpose: "photo",
      contentType: "image/png",
      byteSize: PNG.byteLength,
      itemId,
      sha256: crypto.createHash("sha256").update(PNG).digest("hex"),
    });
    // The key of the bytes stays on the server: random, naming neither the crew nor the file.
    expect(upload).not.toHaveProperty("storageKey");
    const { storage_key: storageKey } = await testDb("uploads").where({ id: upload.id }).first("storage_key");
    expect(storageKey).toMatch(/^uploads\/[0-9a-f]{48}$/);
    expect(storageKey).not.toContain(crew.id);
    const served = await as.member.get(`/api/uploads/${upload.id}`);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("image/png");
    expect(served.headers.get("x-content-type-options")).toBe("nosniff");
    expect(served.headers.get("content-security-policy")).toBe("sandbox");
    expect(Buffer.from(await served.arrayBuffer()).equals(PNG)).toBe(true);
    expect((await as.outsider.get(`/api/uploads/${upload.id}`)).status).toBe(404);
    const detail = await (await as.member.get(`/api/kit/items/${itemId}`)).json();
    expect(detail.photos.map((p: { id: string }) => p.id)).toEqual([upload.id]);
  });

  it("stores a PDF manual of a model, and refuses one for a single item", async () => {
    expect((await as.rigger.post("/api/uploads?purpose=manual", fileForm(PDF, "sling.pdf", { modelId }))).status).toBe(201);
    const onItem = await as.rigger.post("/api/uploads?purpose=manual", fileForm(PDF, "sling.pdf", { itemId }));
    expect(onItem.status).toBe(400);
    expect((await onItem.json()).error).toMatch(/belong to a gear model/);
  });

  const refusals: [string, () => Promise<Response>, number, RegExp][] = [
    ["a photo that is not an image", () => as.rigger.post("/api/uploads?purpose=photo", fileForm(PDF, "sling.png", { itemId })), 415, /contents are not/],
    ["a photo under a name no image has", () => as.rigger.post("/api/uploads?purpose=photo", fileForm(PNG, "sling.exe", { itemId })), 415, /JPEG, PNG or WebP/],
    ["a manual that is not a PDF", () => as.rigger.post("/api/uploads?purpose=manual", fileForm(PNG, "manual.pdf", { modelId })), 415, /contents are not/],
    [
      "a photo over 15 MiB",
      () => as.rigger.post("/api/uploads?purpose=photo", fileForm(Buffer.concat([PNG, Buffer.alloc(15 * 1024 * 1024)]), "big.png", { itemId })),
      413,
      /at most 15 MiB/,
    ],
    ["an upload without a purpose", () => as.rigger.post("/api/uploads", fileForm(PNG, "sling.png", { itemId })), 400, /purpose=photo/],
    ["an upload without a file", () => as.rigger.post("/api/uploads?purpose=photo", new FormData()), 400, /Choose a file/],
    ["a body that is not a form", () => as.rigger.post("/api/uploads?purpose=photo", { file: "x" }), 400, /multipart\/form-data/],
    ["a photo for another crew's item", () => as.outsider.post("/api/uploads?purpose=photo", fileForm(PNG, "sling.png", { itemId })), 404, /of this crew/],
    [
      "a photo from a member",
      () => as.member.post("/api/uploads?purpose=photo", fileForm(PNG, "sling.png", { itemId })),
      403,
      /^Only riggers, leads and owners may add and change gear in the Kit; you are a member of/,
    ],
    // The PNG cut short inside its image data: its signature and header are right, its pixels cannot be read.
    ["a damaged photo", () => as.rigger.post("/api/uploads?purpose=photo", fileForm(PNG.subarray(0, 50), "cut.png", { itemId })), 415, /damaged image/],
  ];
  for (const [what, send, status, message] of refusals) {
    it(`refuses ${what}, saving nothing`, async () => {
      const before = await uploadCount();
      const response = await send();
      expect(response.status).toBe(status);
      expect((await response.json()).error).toMatch(message);
      expect(await uploadCount()).toBe(before);
    });
  }
});

describe("removing files", () => {
  it("removes a photo for a rigger: its record and its bytes; refuses members, other crews and traces", async () => {
    const upload = (await (await as.rigger.post("/api/uploads?purpose=photo", fileForm(PNG, "gone.png", { itemId }))).json()).upload;
    expect((await as.member.delete(`/api/uploads/${upload.id}`)).status).toBe(403);
    expect((await as.outsider.delete(`/api/uploads/${upload.id}`)).status).toBe(404);
    const removed = await as.rigger.delete(`/api/uploads/${upload.id}`);
    expect(removed.status).toBe(200);
    expect((await as.rigger.get(`/api/uploads/${upload.id}`)).status).toBe(404);
    expect(await testDb("uploads").where({ id: upload.id }).first()).toBeUndefined();
    expect((await as.rigger.delete(`/api/uploads/${upload.id}`)).status).toBe(404);

    const [trace] = await testDb("uploads")
      .insert({
        crew_id: crew.id,
        purpose: "trace",
        storage_key: `uploads/test-${crypto.randomUUID()}`,
        file_name: "t.csv",
        content_type: "text/csv",
        byte_size: 1,
        sha256: "0",
        uploaded_by: crew.people.rigger.id,
      })
      .returning("id");
    const refused = await as.rigger.delete(`/api/uploads/${trace.id}`);
    expect(refused.status).toBe(409);
    expect((await refused.json()).error).toBe("A load-cell trace is the record of its slip test and stays with it.");
  });
});
