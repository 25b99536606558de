import { describe, expect, it } from "vitest";
import { checkFileSize, checkFileType, traceText, UPLOAD_LIMITS } from "@/lib/uploads";
import { RequestError } from "@/lib/http-errors";

// Signatures from the formats' own specifications: PNG (ISO/IEC 15948 §5.2), JPEG SOI + APP0 (ISO/IEC 10918-1),
// WebP in a RIFF container (RFC 9649 §2, cited from memory), PDF header (ISO 32000-1 §7.5.2).
const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
const JPEG = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46]);
const WEBP = new TextEncoder().encode("RIFF\u0000\u0000\u0000\u0000WEBPVP8 ");
const PDF = new TextEncoder().encode("%PDF-1.7\n");
const CSV = new TextEncoder().encode("time,force\n0,1\n");

const status = (run: () => unknown) => {
  try {
    run();
  } catch (error) {
    return (error as RequestError).status;
  }
  return 200;
};

describe("checkFileType", () => {
  it("accepts each allowed type when name and content agree, and gives the content type", () => {
    expect(checkFileType("photo", "anchor.PNG", PNG)).toBe("image/png");
    expect(checkFileType("photo", "anchor.jpeg", JPEG)).toBe("image/jpeg");
    expect(checkFileType("photo", "anchor.webp", WEBP)).toBe("image/webp");
    expect(checkFileType("manual", "cam.pdf", PDF)).toBe("application/pdf");
    expect(checkFileType("trace", "pull.csv", CSV)).toBe("text/csv");
  });

  it("refuses a file named like an image whose bytes are not one", () => {
    expect(() => checkFileType("photo", "anchor.png", CSV)).toThrow(/is named like a JPEG, PNG or WebP image .*, but its contents are not/);
    expect(status(() => checkFileType("photo", "anchor.png", PDF))).toBe(415);
  });

  it("refuses an image under another name, and binary data as a trace", () => {
    expect(() => checkFileType("photo", "anchor.gif", PNG)).toThrow(/does not end in one of those extensions/);
    expect(status(() => checkFileType("manual", "cam.pdf", PNG))).toBe(415);
    expect(status(() => checkFileType("trace", "pull.csv", new Uint8Array([0x74, 0, 0x65])))).toBe(415);
    expect(status(() => checkFileType("trace", "pull.csv", new Uint8Array([0xc3, 0x28])))).toBe(415);
  });
});

describe("checkFileSize", () => {
  it("allows a file at the limit and refuses one byte more, saying the limit", () => {
    expect(status(() => checkFileSize("photo", "a.png", UPLOAD_LIMITS.photo))).toBe(200);
    expect(() => checkFileSize("photo", "a.png", UPLOAD_LIMITS.photo + 1)).toThrow(/at most 15 MiB/);
    expect(status(() => checkFileSize("trace", "t.csv", 0))).toBe(400);
  });
});

describe("traceText", () => {
  it("gives a trace's whole text with its type, and refuses binary or non-UTF-8 bytes anywhere in it", () => {
    expect(traceText("pull.csv", CSV)).toEqual({ contentType: "text/csv", text: "time,force\n0,1\n" });
    expect(() => traceText("pull.csv", new Uint8Array([0x74, 0, 0x65]))).toThrow(/contents are not/);
    const lateBadByte = new Uint8Array(70 * 1024).fill(0x31);
    lateBadByte[69 * 1024] = 0xc3;
    lateBadByte[69 * 1024 + 1] = 0x28;
    expect(() => traceText("pull.csv", lateBadByte)).toThrow(/is not UTF-8 text/);
    expect(() => traceText("pull.xlsx", CSV)).toThrow(/does not end in one of those extensions/);
  });
});
