/**
 * Addresses of the public pages that the server prints or mails and the client routes. They are
 * joined to the configured origin (APP_ORIGIN) only, never to a request's headers.
 */

/** The page where anyone can check a PDF against the company's record. */
export const VERIFY_PAGE_PATH = "/verify";

/**
 * @example
 * verifyPageUrl("https://app.tallgrass.example") // "https://app.tallgrass.example/verify"
 * verifyPageUrl("https://app.tallgrass.example/") // "https://app.tallgrass.example/verify"
 */
export function verifyPageUrl(origin: string): string {
  return `${origin.replace(/\/+$/, "")}${VERIFY_PAGE_PATH}`;
}
