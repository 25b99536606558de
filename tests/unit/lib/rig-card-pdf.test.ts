import { describe, expect, it } from "vitest";
import { PDFParse } from "pdf-parse";
import example from "@/physics/examples/quarry-highline.json";
import { CAUTIONS, evaluateRig } from "@/physics";
import { rigCardContent, type RigCardSource } from "@/lib/rig-card/content";
import { rigCardFits, rigCardPdf } from "@/lib/rig-card/pdf";

// The PDF read back with a general-purpose PDF parser (pdf-parse, on Mozilla's pdf.js): its pages and its text.

/** A text of exactly `length` characters, as long as the forms allow. */
const long = (label: string, length: number) => `${label} ${"with a long descriptive name ".repeat(12)}`.slice(0, length);

function source(inputs: Record<string, unknown>, over: Partial<RigCardSource> = {}): RigCardSource {
  const result = evaluateRig(inputs);
  return {
    rigName: "Foxglove gap",
    siteName: "Foxglove Quarry",
    revision: { number: 1, state: "draft", authorName: "Sol Varga", createdAt: "2026-12-01T09:30:00Z", engineVersion: result.engineVersion, inputs, result },
    signOff: null,
    standing: null,
    units: "si",
    rigUrl: "http://127.0.0.1:3000/rigs/5d1c0b7e-1111-4222-8333-444455556666?revision=6e2d1c8f-7777-4888-9999-aaaabbbbcccc",
    ...over,
  };
}

async function read(pdf: Buffer) {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const { text, total } = await parser.getText();
    return { pages: total, text: text.replace(/\s+/g, " ") };
  } finally {
    await parser.destroy();
  }
}

/** The rig with the most the forms allow: 20 components on each anchor, names of 200 characters, a 120-character rig and site name. */
function largestRig() {
  const inputs = structuredClone(example) as typeof example & Record<string, unknown>;
  const components = (side: string) =>
    Array.from({ length: 20 }, (_, i) => ({
      name: long(`Anchor ${side} component ${i}`, 200),
      category: "connector",
      mbsN: 30000 + i * 1000,
      carries: "line",
    }));
  inputs.anchors.a.components = components("A");
  inputs.anchors.b.components = components("B");
  inputs.mainline.name = long("Mainline", 200);
  inputs.backup.name = long("Backup", 200);
  inputs.brake.device = long("Brake", 200);
  inputs.slipBench = inputs.slipBench.map((r) => ({ ...r, device: inputs.brake.device }));
  return inputs;
}

describe("the rig card PDF", () => {
  it("is one A4 page with the rig's name, its state, the figures and every caution", async () => {
    const content = rigCardContent(source(example));
    const pdf = await rigCardPdf(content);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    // A4 is 210 mm × 297 mm = 595.28 pt × 841.89 pt (ISO 216; 1 pt = 1/72 in).
    expect(pdf.toString("latin1")).toMatch(/\/MediaBox \[0 0 595\.28 841\.89\]/);
    const { pages, text } = await read(pdf);
    expect(pages).toBe(1);
    expect(text).toContain("Foxglove gap");
    expect(text).toContain("NOT SIGNED OFF");
    expect(text).toContain("3.50 kN at anchor B");
    for (const caution of CAUTIONS) expect(text).toContain(caution);
  });

  it("fits one page for the largest rig the forms allow, every component and caution on it", async () => {
    const inputs = largestRig();
    const content = rigCardContent(source(inputs, { rigName: long("Rig", 120), siteName: long("Site", 120), units: "us" }));
    expect(rigCardFits(content)).toBe(true);
    const { pages, text } = await read(await rigCardPdf(content));
    expect(pages).toBe(1);
    expect(text).toContain("NOT SIGNED OFF");
    // Every component's factor is on the page (names may be cut short, figures never).
    for (const component of content.components) expect(text).toContain(`${component.factor} ${component.minimum} ${component.result}`);
    // Cautions may be cut to a line each at this size, but each one's start is there.
    for (const caution of CAUTIONS) expect(text).toContain(caution.slice(0, 40));
  });

  it("spells letters the font lacks without their accents, and says so", async () => {
    const { text } = await read(await rigCardPdf(rigCardContent(source(example, { rigName: "Łódź gap", siteName: "Špičák" }))));
    expect(text).toContain("Lódz gap");
    expect(text).toContain("Site: Spicák");
    expect(text).toContain("written without their accents");
    expect((await read(await rigCardPdf(rigCardContent(source(example))))).text).not.toContain("without their accents");
  });

  it("shows the sign-off and no NOT SIGNED OFF band on a signed-off revision", async () => {
    const signOff = {
      signedByName: "Idris Lund",
      signedAt: "2026-12-01T10:05:00Z",
      statement: "I have checked this revision.",
      contentHash: "0123456789abcdef".repeat(4),
      engineVersion: "1.0.0",
      revisionNumber: 1,
    };
    const base = source(example);
    const content = rigCardContent({ ...base, revision: { ...base.revision, state: "signed_off" }, signOff, standing: signOff });
    const { text } = await read(await rigCardPdf(content));
    expect(text).toContain("SIGNED OFF");
    expect(text).not.toContain("NOT SIGNED OFF");
    expect(text).toContain("Idris Lund");
    expect(text).toContain("0123456789abcdef");
    expect(text).not.toContain("0123456789abcdef0");
  });
});
