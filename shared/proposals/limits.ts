// Limits read by the schemas, the client's fields and the PDF. No zod here, so the client imports them cheaply.
/**
 * What one proposal can hold: far more than a real one needs (two or three options of five to
 * fifteen scope lines), and small enough that the largest legal proposal still draws in seconds
 * (issue 13, item 6; decision 27). The client's fields, the API and the PDF read these.
 */
export const PROPOSAL_LIMITS = {
  maxOptions: 4,
  maxScopeLines: 25,
  maxScopeLineChars: 300,
  maxCoverNoteChars: 2_000,
  maxTermsChars: 10_000,
  maxPhotos: 24,
} as const;

/** An option's notes: a paragraph or two for the homeowner (the PDF prints them under the option's name). */
export const OPTION_NOTES_MAX_CHARS = 2_000;
