/** The part of woff2sfnt-sfnt2woff 1.0 used here (the package ships no types): WOFF 1.0 ↔ SFNT. */
declare module "woff2sfnt-sfnt2woff" {
  /** Unpacks a WOFF 1.0 file into the TrueType/OpenType file it wraps; throws on a checksum mismatch. */
  export function toSfnt(woff: Buffer): Buffer;
  /** Packs a TrueType/OpenType file as WOFF 1.0. */
  export function toWoff(sfnt: Buffer): Buffer;
}
