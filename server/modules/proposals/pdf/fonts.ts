import { createRequire } from "node:module";
import { Font } from "@react-pdf/renderer";

const require = createRequire(import.meta.url);
const WEIGHTS = [400, 600, 700] as const;

/** react-pdf reads WOFF, not WOFF2; each subset is its own family, and text names both so Łódź renders. */
export const PLEX_FAMILIES = ["PlexLatin", "PlexLatinExt"];

let isRegistered = false;

export function registerFonts(): void {
  if (isRegistered) return;
  for (const [family, subset] of [["PlexLatin", "latin"], ["PlexLatinExt", "latin-ext"]] as const) {
    Font.register({
      family,
      fonts: WEIGHTS.map((fontWeight) => ({
        src: require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-${subset}-${fontWeight}-normal.woff`),
        fontWeight,
      })),
    });
  }
  // Words are never split with hyphens: a proposal's numbers and names must read whole.
  Font.registerHyphenationCallback((word) => [word]);
  isRegistered = true;
}
