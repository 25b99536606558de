import "server-only";
import fs from "node:fs";
import path from "node:path";
import PDFDocument from "pdfkit";
import QRCode from "qrcode";
import type { CardComponent, CardRow, CardSection, RigCardContent } from "./content";
import { drawableText } from "./glyphs";

// The rig card as a one-page A4 PDF, black on white, in the shipped Inter (static latin woff files, which
// pdfkit embeds). Everything is laid out twice: measured at a type size, shrunk until it fits one page,
// then drawn. Every text box has a height, so pdfkit never breaks onto a second page.

const PAGE = { width: 595.28, height: 841.89 };
const MARGIN = 32;
const WIDTH = PAGE.width - 2 * MARGIN;
const QR_SIZE = 84;
const GUTTER = 14;
const INK = "#000000";
const RULE = "#8a8a8a";

const FONT_DIR = path.join(process.cwd(), "node_modules/@fontsource/inter/files");
let fonts: { regular: Buffer; bold: Buffer } | null = null;
const interFonts = () =>
  (fonts ??= {
    regular: fs.readFileSync(path.join(FONT_DIR, "inter-latin-400-normal.woff")),
    bold: fs.readFileSync(path.join(FONT_DIR, "inter-latin-700-normal.woff")),
  });

interface Attempt {
  /** Shrinks every type size and gap together. */
  scale: number;
  /** Lines a table cell may take (a long component name is cut with an ellipsis past them). */
  cellLines: number;
  /** The component table in two halves side by side, for a rig with many components. */
  splitTable: boolean;
  /** Cautions cut to one line each: the last resort, never dropping one. */
  shortCautions: boolean;
}

/** The type sizes and gaps of one attempt. */
function sizes({ scale, cellLines, splitTable }: Attempt) {
  // With the table in halves, a long gear name in the figures is cut at three lines: it is in the table too.
  const valueLines = splitTable ? 3 : Infinity;
  return {
    title: 17 * scale,
    body: 8 * scale,
    small: 6.8 * scale,
    heading: 9.5 * scale,
    band: 24 * Math.max(scale, 0.8),
    gap: 3 * scale,
    cellLines,
    valueLines,
  };
}
type Sizes = ReturnType<typeof sizes>;

type Doc = PDFKit.PDFDocument;
type Font = "regular" | "bold";

/** Measures (draw false) or draws (draw true) text in a box; returns the height it takes. */
class Pen {
  constructor(
    readonly doc: Doc,
    readonly draw: boolean,
    // Laying text out is the costly part; every attempt and the drawing measure the same boxes again.
    private readonly measured = new Map<string, number>(),
  ) {}

  /** The same pen measuring only (for the column split). */
  measuring(): Pen {
    return new Pen(this.doc, false, this.measured);
  }

  height(text: string, font: Font, size: number, width: number, maxLines = Infinity): number {
    this.doc.font(font).fontSize(size);
    const key = `${font}|${size}|${width}|${text}`;
    let full = this.measured.get(key);
    if (full === undefined) this.measured.set(key, (full = this.doc.heightOfString(text, { width, lineGap: 0.5 })));
    return Math.min(full, maxLines * this.doc.currentLineHeight(true) + 0.5 * maxLines);
  }

  text(
    text: string,
    x: number,
    y: number,
    font: Font,
    size: number,
    width: number,
    options: { maxLines?: number; align?: "left" | "right" | "center"; color?: string } = {},
  ) {
    const height = this.height(text, font, size, width, options.maxLines);
    if (this.draw) {
      this.doc
        .font(font)
        .fontSize(size)
        .fillColor(options.color ?? INK)
        .text(text, x, y, { width, height: height + 0.5, lineGap: 0.5, align: options.align ?? "left", ellipsis: true });
    }
    return height;
  }

  rule(x: number, y: number, width: number, weight = 0.4, color = RULE) {
    if (this.draw)
      this.doc
        .moveTo(x, y)
        .lineTo(x + width, y)
        .lineWidth(weight)
        .strokeColor(color)
        .stroke();
  }
}

function rowsBlock(pen: Pen, rows: CardRow[], x: number, y: number, width: number, s: Sizes): number {
  let at = y;
  for (const row of rows) {
    // The figure takes what it needs (up to 55 %), the label the rest: fewer wrapped lines.
    pen.doc.font("bold").fontSize(s.body);
    const valueWidth = Math.min(pen.doc.widthOfString(row.value) + 1, width * 0.55);
    const labelWidth = width - valueWidth - 6;
    const h = Math.max(pen.height(row.label, "regular", s.body, labelWidth), pen.height(row.value, "bold", s.body, valueWidth, s.valueLines));
    pen.text(row.label, x, at + s.gap / 2, row.alert ? "bold" : "regular", s.body, labelWidth);
    pen.text(row.value, x + labelWidth + 6, at + s.gap / 2, "bold", s.body, valueWidth, { align: "right", maxLines: s.valueLines });
    // A failing or unknown check carries a black bar: it must stand out without colour.
    if (row.alert && pen.draw) pen.doc.rect(x - 5, at + s.gap / 3, 2.5, h + s.gap / 3).fill(INK);
    at += h + s.gap;
    pen.rule(x, at, width);
  }
  return at - y;
}

function section(pen: Pen, sec: CardSection, x: number, y: number, width: number, s: Sizes): number {
  let at = y;
  at += pen.text(sec.title, x, at, "bold", s.heading, width);
  pen.rule(x, at + 1, width, 1, INK);
  at += 2;
  if (sec.note) at += pen.text(sec.note, x, at + s.gap / 2, "regular", s.small, width) + s.gap / 2;
  at += rowsBlock(pen, sec.rows, x, at, width, s);
  return at - y + 3 * s.gap;
}

/** Splits the sections into two columns in their order, where the taller column is lowest. */
function columns(pen: Pen, sections: CardSection[], width: number, s: Sizes): [CardSection[], CardSection[]] {
  const heights = sections.map((sec) => section(pen.measuring(), sec, 0, 0, width, s));
  let best = 1;
  let bestHeight = Infinity;
  for (let split = 1; split < sections.length; split++) {
    const left = heights.slice(0, split).reduce((a, b) => a + b, 0);
    const right = heights.slice(split).reduce((a, b) => a + b, 0);
    if (Math.max(left, right) < bestHeight) [best, bestHeight] = [split, Math.max(left, right)];
  }
  return [sections.slice(0, best), sections.slice(best)];
}

const COMPONENT_COLUMNS: { key: keyof CardComponent; header: string; align: "left" | "right" }[] = [
  { key: "name", header: "Component", align: "left" },
  { key: "where", header: "Where", align: "left" },
  { key: "factor", header: "Factor", align: "right" },
  { key: "minimum", header: "Minimum", align: "right" },
  { key: "result", header: "Result", align: "left" },
  { key: "mbs", header: "MBS", align: "right" },
  { key: "peakLoad", header: "Peak load", align: "right" },
];
type Column = (typeof COMPONENT_COLUMNS)[number];

const resultText = (component: CardComponent) => (component.result === "Fails" ? "FAILS" : component.result);
const cellText = (component: CardComponent, c: Column) => (c.key === "result" ? resultText(component) : component[c.key]);

/** Column widths: figures, verdicts and places as wide as their widest cell (a place up to 45 % of the rest); the name takes what is left. */
function columnWidths(pen: Pen, components: CardComponent[], width: number, s: Sizes): number[] {
  pen.doc.font("bold").fontSize(s.body);
  // Headers may wrap to two lines; the cells never.
  const widest = (c: Column) => Math.max(...[...c.header.split(" "), ...components.map((k) => cellText(k, c))].map((t) => pen.doc.widthOfString(t))) + 6;
  const fixed = COMPONENT_COLUMNS.map((c) => (c.key === "name" || c.key === "where" ? 0 : widest(c)));
  const rest = width - fixed.reduce((a, b) => a + b, 0);
  const where = Math.min(widest(COMPONENT_COLUMNS.find((c) => c.key === "where")!), rest * 0.45);
  return COMPONENT_COLUMNS.map((c, i) => (c.key === "name" ? rest - where : c.key === "where" ? where : fixed[i]));
}

/** One column of the component table (header, then the rows); returns its height. */
function tableColumn(pen: Pen, components: CardComponent[], x: number, y: number, width: number, s: Sizes): number {
  let at = y;
  const widths = columnWidths(pen, components, width, s);
  const line = (cell: (c: Column) => string, font: (c: Column) => Font, maxLines = s.cellLines) => {
    let left = x;
    let h = 0;
    COMPONENT_COLUMNS.forEach((c, i) => {
      h = Math.max(h, pen.text(cell(c), left, at + s.gap / 2, font(c), s.body, widths[i] - 4, { align: c.align, maxLines }));
      left += widths[i];
    });
    at += h + s.gap;
    pen.rule(x, at, width);
  };
  line(
    (c) => c.header,
    () => "bold",
    2,
  );
  for (const component of components) {
    line(
      (c) => cellText(component, c),
      (c) => (c.key === "factor" || c.key === "result" ? "bold" : "regular"),
    );
  }
  return at - y;
}

function componentTable(pen: Pen, components: CardComponent[], y: number, s: Sizes, split: boolean): number {
  let at = y;
  at += pen.text("Safety factors: every component in the load path (MBS ÷ peak load)", MARGIN, at, "bold", s.heading, WIDTH);
  pen.rule(MARGIN, at + 1, WIDTH, 1, INK);
  at += s.gap;
  if (components.length === 0) return at - y + pen.text("No components in the load path.", MARGIN, at + s.gap, "regular", s.body, WIDTH) + 4 * s.gap;
  if (!split) return at - y + tableColumn(pen, components, MARGIN, at, WIDTH, s) + 3 * s.gap;
  const half = (WIDTH - GUTTER) / 2;
  const first = Math.ceil(components.length / 2);
  const height = Math.max(
    tableColumn(pen, components.slice(0, first), MARGIN, at, half, s),
    tableColumn(pen, components.slice(first), MARGIN + half + GUTTER, at, half, s),
  );
  return at - y + height + 3 * s.gap;
}

function statusBand(pen: Pen, status: RigCardContent["status"], y: number, s: Sizes): number {
  const pad = 8;
  const inner = WIDTH - 2 * pad;
  const headingHeight = pen.height(status.heading, "bold", s.band, inner, 2);
  const detailHeight = pen.height(status.detail, "regular", s.body, inner);
  const height = pad + headingHeight + 3 + detailHeight + pad;
  if (pen.draw) {
    // Not signed off: a solid black band, seen from across the anchor; signed off: a heavy frame.
    if (status.signedOff) pen.doc.lineWidth(2.5).strokeColor(INK).rect(MARGIN, y, WIDTH, height).stroke();
    else pen.doc.rect(MARGIN, y, WIDTH, height).fill(INK);
  }
  const color = status.signedOff ? INK : "#ffffff";
  pen.text(status.heading, MARGIN + pad, y + pad, "bold", s.band, inner, { color, maxLines: 2 });
  pen.text(status.detail, MARGIN + pad, y + pad + headingHeight + 3, "regular", s.body, inner, { color });
  let at = y + height + 6;
  if (status.rows.length > 0) {
    const [statement, ...short] = [status.rows.find((r) => r.label === "Statement"), ...status.rows.filter((r) => r.label !== "Statement")];
    const half = (WIDTH - GUTTER) / 2;
    const left = short.slice(0, Math.ceil(short.length / 2));
    const right = short.slice(Math.ceil(short.length / 2));
    at += Math.max(rowsBlock(pen, left, MARGIN, at, half, s), rowsBlock(pen, right, MARGIN + half + GUTTER, at, half, s));
    if (statement) at += pen.text(`Statement signed: “${statement.value}”`, MARGIN, at + 3, "regular", s.small, WIDTH) + 3;
    at += 6;
  }
  return at - y + 4;
}

function cautionsBlock(pen: Pen, cautions: readonly string[], y: number, s: Sizes, short: boolean): number {
  let at = y;
  at += pen.text("Cautions", MARGIN, at, "bold", s.heading, WIDTH);
  pen.rule(MARGIN, at + 1, WIDTH, 1, INK);
  at += 4;
  for (const caution of cautions) {
    pen.text("•", MARGIN, at, "regular", s.small, 8);
    at += pen.text(caution, MARGIN + 8, at, "regular", s.small, WIDTH - 8, { maxLines: short ? 1 : Infinity }) + s.gap / 1.5;
  }
  return at - y + 2 * s.gap;
}

/** Lays the whole card out from the top (drawing it when given the QR code); returns where it ends. */
function layout(doc: Doc, measured: Map<string, number>, content: RigCardContent, qr: Buffer | null, attempt: Attempt): number {
  const draw = qr !== null;
  const pen = new Pen(doc, draw, measured);
  const s = sizes(attempt);
  const headWidth = WIDTH - QR_SIZE - GUTTER;
  let y = MARGIN;
  y += pen.text("SPANWRIGHT RIG CARD", MARGIN, y, "bold", s.small, headWidth) + 2;
  y += pen.text(content.rigName, MARGIN, y, "bold", s.title, headWidth, { maxLines: 2 }) + 3;
  y += pen.text(content.about, MARGIN, y, "regular", s.body, headWidth) + 2;
  if (qr) {
    doc.image(qr, PAGE.width - MARGIN - QR_SIZE, MARGIN - 4, { width: QR_SIZE, height: QR_SIZE });
    pen.text("Scan for this revision", PAGE.width - MARGIN - QR_SIZE, MARGIN + QR_SIZE - 4, "regular", s.small, QR_SIZE, { align: "center" });
  }
  y = Math.max(y, MARGIN + QR_SIZE + 6) + 4;
  y += statusBand(pen, content.status, y, s);

  const half = (WIDTH - GUTTER) / 2;
  const [left, right] = columns(pen, content.sections, half, s);
  const columnHeight = (list: CardSection[], x: number) => list.reduce((at, sec) => at + section(pen, sec, x, y + at, half, s), 0);
  y += Math.max(columnHeight(left, MARGIN), columnHeight(right, MARGIN + half + GUTTER));
  y += componentTable(pen, content.components, y, s, attempt.splitTable);
  y += cautionsBlock(pen, content.cautions, y, s, attempt.shortCautions);
  y += pen.text(content.footer, MARGIN, y, "regular", s.small, WIDTH) + 2;
  y += pen.text(`This card online: ${content.rigUrl}`, MARGIN, y, "regular", s.small, WIDTH);
  return y;
}

const steps = (from: number, to: number) => Array.from({ length: Math.round((from - to) / 0.05) + 1 }, (_, i) => from - i * 0.05);

// Largest type first; then the table in two halves, then cells cut to a line, and last every caution cut to a line (none
// dropped). A component's name keeps two lines as long as it can: it is what tells the rows apart.
const ATTEMPTS: Attempt[] = [
  ...steps(1, 0.7).map((scale) => ({ scale, cellLines: 2, splitTable: false, shortCautions: false })),
  ...steps(0.8, 0.6).map((scale) => ({ scale, cellLines: 2, splitTable: true, shortCautions: false })),
  ...steps(0.8, 0.6).map((scale) => ({ scale, cellLines: 1, splitTable: true, shortCautions: false })),
  ...steps(0.65, 0.55).map((scale) => ({ scale, cellLines: 1, splitTable: true, shortCautions: true })),
];

const BOTTOM = PAGE.height - MARGIN;

/** The largest layout of the card that fits on the page, or null when even the smallest does not. */
function fittingAttempt(doc: Doc, measured: Map<string, number>, content: RigCardContent): Attempt | null {
  return ATTEMPTS.find((a) => layout(doc, measured, content, null, a) <= BOTTOM) ?? null;
}

function cardDocument(content: RigCardContent): Doc {
  const { regular, bold } = interFonts();
  const doc = new PDFDocument({
    size: "A4",
    margin: 0,
    info: { Title: `Rig card: ${content.rigName}`, Subject: content.status.heading, Creator: "Spanwright" },
  });
  doc.registerFont("regular", regular);
  doc.registerFont("bold", bold);
  return doc;
}

/** Whether the card fits one page at some size (for the tests: the PDF is drawn at the smallest even when not). */
export const rigCardFits = (source: RigCardContent) => {
  const content = drawableContent(source);
  return fittingAttempt(cardDocument(content), new Map(), content) !== null;
};

/** The content with every text drawable in the shipped font; the footer says so when a name had to change. */
function drawableContent(content: RigCardContent): RigCardContent {
  let changed = false;
  const drawn: RigCardContent = JSON.parse(JSON.stringify(content), (_key, value) => {
    if (typeof value !== "string") return value;
    const d = drawableText(value);
    changed ||= d.changed;
    return d.text;
  });
  if (changed) drawn.footer += " Letters this card's font does not have are written without their accents (or as ?): the print page shows names as saved.";
  return drawn;
}

/** The rig card as PDF bytes: one A4 page. */
export async function rigCardPdf(source: RigCardContent): Promise<Buffer> {
  const content = drawableContent(source);
  const qr = await QRCode.toBuffer(content.rigUrl, { type: "png", errorCorrectionLevel: "M", margin: 1, scale: 6 });
  const doc = cardDocument(content);
  const measured = new Map<string, number>();
  const attempt = fittingAttempt(doc, measured, content);
  if (!attempt) console.error(`Rig card for "${content.rigName}": even the smallest layout runs past the page; drawn at the smallest.`);
  layout(doc, measured, content, qr, attempt ?? ATTEMPTS[ATTEMPTS.length - 1]);

  const chunks: Buffer[] = [];
  doc.on("data", (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  doc.end();
  return done;
}
