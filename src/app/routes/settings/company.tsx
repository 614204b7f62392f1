import { CompanyPage } from "@/features/company/pages/company-page";

/** Owner only (guarded in the router). */
export function Component() {
  return <CompanyPage />;
}
