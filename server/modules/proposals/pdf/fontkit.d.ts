/** The part of fontkit 2 (the font reader inside @react-pdf/renderer; it ships no types) the font test reads. */
declare module "fontkit" {
  export interface Glyph { id: number; path: { toSVG(): string } }
  export interface Font {
    type: string;
    postscriptName: string;
    numGlyphs: number;
    unitsPerEm: number;
    ascent: number;
    descent: number;
    xHeight: number;
    characterSet: number[];
    layout(text: string): { glyphs: Glyph[]; positions: { xAdvance: number }[] };
  }
  export function create(buffer: Uint8Array, postscriptName?: string): Font | { fonts: Font[] };
}
