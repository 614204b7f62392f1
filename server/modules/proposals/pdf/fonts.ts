import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { Font } from "@react-pdf/renderer";
import { toSfnt } from "woff2sfnt-sfnt2woff";

const require = createRequire(import.meta.url);
const WEIGHTS = [400, 600, 700] as const;

/** react-pdf reads WOFF and TTF, not WOFF2; each subset is its own family, and text names both so Łódź renders. */
export const PLEX_FAMILIES = ["PlexLatin", "PlexLatinExt"];

/**
 * What the PDF embeds the fonts from. "ttf" (the default): each shipped WOFF is unpacked once, at
 * registration, into its plain TrueType tables. fontkit reads a WOFF's tables by inflating them
 * again on every access (twice per glyph drawn), which cost about a tenth of each render; TrueType
 * tables are read in place. "woff" keeps the shipped files as they are: the PDF benchmark's baseline.
 */
export type FontSource = "ttf" | "woff";

let registered: FontSource | null = null;

const woffPath = (subset: "latin" | "latin-ext", fontWeight: number) =>
  require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-${subset}-${fontWeight}-normal.woff`);

/** The shipped WOFF as a TrueType data URL (toSfnt checks every table's checksum). */
export function woffAsTtfDataUrl(file: string): string {
  return `data:font/ttf;base64,${toSfnt(readFileSync(file)).toString("base64")}`;
}

/** Registers the fonts once per process; a later call without a source keeps what is registered. */
export function registerFonts(source?: FontSource): void {
  if (registered) {
    if (source && registered !== source) throw new Error(`the PDF fonts are already registered from ${registered}`);
    return;
  }
  source ??= "ttf";
  for (const [family, subset] of [["PlexLatin", "latin"], ["PlexLatinExt", "latin-ext"]] as const) {
    Font.register({
      family,
      fonts: WEIGHTS.map((fontWeight) => {
        const file = woffPath(subset, fontWeight);
        return { src: source === "ttf" ? woffAsTtfDataUrl(file) : file, fontWeight };
      }),
    });
  }
  // Words are never split with hyphens: a proposal's numbers and names must read whole.
  Font.registerHyphenationCallback((word) => [word]);
  registered = source;
}
