import { describe, expect, it } from "vitest";
import { holdsLoneSurrogate, holdsNul, jsonDepthWithin, readBodyBytes, readJson } from "@/lib/request-body";
import { RequestError } from "@/lib/http-errors";

const tooLarge = (size: number) => new RequestError(413, `too large: ${size}`);

describe("readBodyBytes", () => {
  it("refuses an announced length over the limit before reading, and a chunked body as soon as it passes it", async () => {
    const announced = new Request("http://x/", { method: "POST", body: "12345", headers: { "content-length": "5" } });
    await expect(readBodyBytes(announced, 4, tooLarge)).rejects.toThrow("too large: 5");
    let pulled = 0;
    const endless = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled++;
        controller.enqueue(new Uint8Array(1000));
      },
    });
    const chunked = new Request("http://x/", { method: "POST", body: endless, duplex: "half" } as RequestInit);
    await expect(readBodyBytes(chunked, 10_000, tooLarge)).rejects.toThrow("too large: 11000");
    expect(pulled).toBeLessThan(20);
  });

  it("returns the bytes of a body within the limit", async () => {
    const bytes = await readBodyBytes(new Request("http://x/", { method: "POST", body: "abc" }), 3, tooLarge);
    expect(new TextDecoder().decode(bytes)).toBe("abc");
  });
});

describe("jsonDepthWithin", () => {
  it("counts nesting outside strings only", () => {
    expect(jsonDepthWithin('{"a":[[1]]}', 3)).toBe(true);
    expect(jsonDepthWithin('{"a":[[1]]}', 2)).toBe(false);
    expect(jsonDepthWithin('{"a":"[[[[\\"[["}', 1)).toBe(true);
  });
});

describe("readJson", () => {
  const body = (text: string) => new Request("http://x/", { method: "POST", body: text });
  it("refuses deep nesting, broken JSON and NUL characters with a 400", async () => {
    await expect(readJson(body("[".repeat(1000) + "]".repeat(1000)))).rejects.toMatchObject({ status: 400 });
    await expect(readJson(body("{"))).rejects.toMatchObject({ status: 400, message: "The request body is not valid JSON." });
    await expect(readJson(body('{"name":"a\\u0000b"}'))).rejects.toMatchObject({ status: 400, message: expect.stringMatching(/NUL character/) });
    expect(await readJson(body('{"name":"a\\\\u0000b"}'))).toEqual({ name: "a\\u0000b" });
  });

  it("finds a NUL character in nested strings and keys", () => {
    expect(holdsNul({ a: [{ b: "x\u0000" }] })).toBe(true);
    expect(holdsNul({ "k\u0000": 1 })).toBe(true);
    expect(holdsNul({ a: ["x", 1, null] })).toBe(false);
  });

  it("finds half of a surrogate pair anywhere, and lets whole pairs through (a lone surrogate is no character: the Unicode Standard, chapter 3, from memory)", () => {
    expect(holdsLoneSurrogate({ items: [{ text: "\ud800" }] })).toBe(true);
    expect(holdsLoneSurrogate({ "k\udc00": 1 })).toBe(true);
    expect(holdsLoneSurrogate(["a\ud83dz"])).toBe(true);
    expect(holdsLoneSurrogate({ text: "rope 👩‍👩‍👧 \ud83d\ude00" })).toBe(false);
  });
});
