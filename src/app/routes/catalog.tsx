import { CatalogPage } from "@/features/catalog/pages/catalog-page";
import { useCanAccess } from "@/lib/session";

/** The company catalog; the owner edits it, others read it. */
export function Component() {
  return <CatalogPage canEdit={useCanAccess("catalog-edit")} />;
}
