/**
 * Change orders (DESIGN.md §3): the only way signed work changes. Drafted by sales against an
 * accepted proposal revision, sent through the homeowner's link, signed (or declined) with the
 * same e-sign consent. Only a signed one changes the job's scope, total and the crew's list.
 */
import type { CatalogItem } from "../schemas/catalog";

export const CHANGE_ORDER_STATUSES = ["draft", "sent", "signed", "declined"] as const;
export type ChangeOrderStatus = (typeof CHANGE_ORDER_STATUSES)[number];

/** The catalog item a line refers to, copied when the line is written so later catalog edits change nothing. */
export type ChangeOrderItem = Pick<CatalogItem, "id" | "sku" | "name" | "kind" | "unit" | "soldInLengthFt">;

export interface ChangeOrderLine {
  id: string;
  /** Added to the signed work, or taken out of it. */
  action: "add" | "remove";
  description: string;
  /** Count, feet or hours, as `unit` says. */
  quantity: number;
  unit: string;
  unitPriceCents: number;
  /** Set when the line is a catalog material: it then changes the crew's materials list. */
  item: ChangeOrderItem | null;
}

export interface ChangeOrderTotals {
  addedCents: number;
  removedCents: number;
  taxRateBasisPoints: number;
  /** Tax on the added lines less tax on the removed ones. */
  taxChangeCents: number;
  /** What the job total changes by, tax included; negative when work is taken out. */
  changeCents: number;
}

/** What the homeowner signs: frozen when the change order is sent, hashed like a proposal's snapshot. */
export interface ChangeOrderSnapshot {
  formatVersion: 1;
  changeOrderId: string;
  number: number;
  proposalId: string;
  proposalRevision: number;
  optionName: string;
  preparedAt: string;
  company: { name: string; licenseNumber: string | null; addressLine: string | null; phone: string | null; email: string | null };
  customer: { name: string; firstName: string };
  site: { address: string; projectTitle: string };
  seller: { name: string; email: string | null };
  reason: string;
  lines: (ChangeOrderLine & { totalCents: number })[];
  totals: ChangeOrderTotals;
  /** The job total before this change (the signed proposal and earlier signed change orders) and after it. */
  previousTotalCents: number;
  newTotalCents: number;
  photos: { id: string; caption: string | null; storageKey: string; contentType: string }[];
  esign: { version: string; text: string[] };
}

export interface ChangeOrderAcceptance {
  signerName: string;
  signature: { typed: string | null; pngStorageKey: string | null; pngSha256: string | null };
  consentTextVersion: string;
  signedAt: string;
  ip: string | null;
  userAgent: string | null;
}
