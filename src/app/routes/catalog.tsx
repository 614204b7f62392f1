import { EmptyState } from "@/components/ui/empty-state";
import { BoxIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { useCanAccess } from "@/lib/session";

// Placeholder until the catalog work lands.
export function Component() {
  const canEdit = useCanAccess("catalog-edit");
  return (
    <>
      <PageHeader
        title="Catalog"
        description="The vents, fans and labour you sell, with net free area ratings and prices."
      />
      <EmptyState
        icon={<BoxIcon />}
        title="The catalog is empty"
        description={
          canEdit
            ? "You'll list ridge, soffit, box and powered vents here with their rated net free area, your price and labour, so design options price themselves."
            : "Products and prices will be listed here for reference. Only the company owner changes prices."
        }
      />
    </>
  );
}
