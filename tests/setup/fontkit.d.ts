/** The few parts of fontkit (no types published) the font-coverage test reads. */
declare module "fontkit" {
  interface Font {
    hasGlyphForCodePoint(codePoint: number): boolean;
  }
  export function openSync(path: string): Font;
}
