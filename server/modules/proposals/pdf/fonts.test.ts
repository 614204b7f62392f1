import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import * as fontkit from "fontkit";
import { describe, expect, it } from "vitest";
import { woffAsTtfDataUrl } from "./fonts.ts";

const require = createRequire(import.meta.url);
const files = ["latin-400", "latin-700", "latin-ext-600"].map((name) =>
  require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-${name}-normal.woff`));

// fontkit (the reader @react-pdf/renderer embeds fonts with) opens the shipped WOFF and our
// TrueType side by side: the same font must come out, glyph for glyph.
describe("the PDF fonts unpacked from the shipped WOFF", () => {
  it.each(files)("when %s is unpacked, then it is TrueType with the same names, metrics and glyph outlines", (file) => {
    const ttfBytes = Buffer.from(woffAsTtfDataUrl(file).split(",")[1]!, "base64");
    expect(ttfBytes.readUInt32BE(0)).toBe(0x00010000); // TrueType sfnt version
    const woff = fontkit.create(readFileSync(file)) as fontkit.Font;
    const ttf = fontkit.create(ttfBytes) as fontkit.Font;
    expect(woff.type).toBe("WOFF");
    expect(ttf.type).toBe("TTF");
    expect(ttf.postscriptName).toBe(woff.postscriptName);
    expect(ttf.numGlyphs).toBe(woff.numGlyphs);
    expect([ttf.unitsPerEm, ttf.ascent, ttf.descent, ttf.xHeight]).toEqual([woff.unitsPerEm, woff.ascent, woff.descent, woff.xHeight]);
    // Every character the subset maps (a few hundred; U+FFFF is the cmap's end marker), one by one.
    const codePoints = woff.characterSet.filter((c) => c !== 0xffff);
    expect(codePoints.length).toBeGreaterThan(200);
    for (const codePoint of codePoints) {
      const text = String.fromCodePoint(codePoint);
      const fromTtf = ttf.layout(text);
      let fromWoff: ReturnType<fontkit.Font["layout"]>;
      try {
        fromWoff = woff.layout(text);
      } catch {
        // fontkit cannot read an empty glyph (the latin-ext subset's space) out of WOFF at all: in TrueType it is empty.
        expect(fromTtf.glyphs[0]!.path.toSVG(), `U+${codePoint.toString(16)}`).toBe("");
        continue;
      }
      expect(fromTtf.glyphs.map((g) => g.id), `U+${codePoint.toString(16)}`).toEqual(fromWoff.glyphs.map((g) => g.id));
      expect(fromTtf.positions[0]!.xAdvance).toBe(fromWoff.positions[0]!.xAdvance);
      expect(fromTtf.glyphs[0]!.path.toSVG()).toBe(fromWoff.glyphs[0]!.path.toSVG());
    }
  });
});
