// The shipped Inter files are the latin subset: these code points only (the subset's unicode-range in
// @fontsource/inter's 400.css). Text for the PDF keeps them and spells any other letter without its accent.
const LATIN_SUBSET: readonly [number, number][] = [
  [0x0000, 0x00ff],
  [0x0131, 0x0131],
  [0x0152, 0x0153],
  [0x02bb, 0x02bc],
  [0x02c6, 0x02c6],
  [0x02da, 0x02da],
  [0x02dc, 0x02dc],
  [0x0304, 0x0304],
  [0x0308, 0x0308],
  [0x0329, 0x0329],
  [0x2000, 0x206f],
  [0x20ac, 0x20ac],
  [0x2122, 0x2122],
  [0x2191, 0x2191],
  [0x2193, 0x2193],
  [0x2212, 0x2212],
  [0x2215, 0x2215],
  [0xfeff, 0xfeff],
  [0xfffd, 0xfffd],
];

/** Letters with a stroke, which do not come apart under NFKD: their plain letter. */
const STROKED: Record<string, string> = { Ł: "L", ł: "l", Đ: "D", đ: "d", Ħ: "H", ħ: "h", Ŧ: "T", ŧ: "t", Ƶ: "Z", ƶ: "z" };

export const isDrawn = (char: string) => {
  const code = char.codePointAt(0)!;
  return LATIN_SUBSET.some(([from, to]) => code >= from && code <= to);
};

/** A character the font draws: itself, else its letter without accents or stroke, else "?". */
function drawable(char: string): string {
  if (isDrawn(char)) return char;
  const plain = (STROKED[char] ?? char.normalize("NFKD")).replace(/[\u0300-\u036f]/g, "");
  return plain !== "" && [...plain].every(isDrawn) ? plain : "?";
}

/** Text the card's font can draw, and whether any letter had to change. */
export function drawableText(text: string): { text: string; changed: boolean } {
  const out = [...text].map(drawable).join("");
  return { text: out, changed: out !== text };
}
