/** A customer as the API returns it. Dates are ISO 8601 strings. */
export interface Customer {
  id: string;
  name: string;
  phone: string | null;
  email: string | null;
  billingAddress: string | null;
  notes: string | null;
  createdAt: string;
  updatedAt: string;
  /** How many projects name this customer (the list and detail include it). */
  projectCount?: number;
}

export type CustomerSort = "name" | "createdAt" | "updatedAt";

export interface CustomerListParams {
  q: string;
  sort: CustomerSort;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}

export interface CustomerPage {
  items: Customer[];
  total: number;
  page: number;
  pageSize: number;
}
