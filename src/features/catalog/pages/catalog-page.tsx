import { useQuery } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import { CATALOG_KINDS, type CatalogKind } from "@shared/schemas/catalog";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { EmptyState } from "@/components/ui/empty-state";
import { TextField } from "@/components/ui/field";
import { BoxIcon, PlusIcon, SearchIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Select } from "@/components/ui/select";
import { LoadingBlock } from "@/components/ui/spinner";
import { toast } from "@/components/ui/toaster";
import { catalogQueries } from "../api/queries";
import type { CatalogRecord } from "../api/types";
import { useUpdateCatalogItem } from "../api/update-catalog-item";
import { CatalogCsvPanel } from "../components/catalog-import";
import { CatalogItemDialog } from "../components/catalog-item-dialog";
import { CatalogTable } from "../components/catalog-table";
import { useDebouncedValue } from "@/lib/use-debounced-value";
import { kindLabel } from "../lib/labels";

const KIND_FILTER = [{ value: "", label: "All kinds" }, ...CATALOG_KINDS.map((kind) => ({ value: kind, label: kindLabel(kind) }))];

/** The company catalog: everyone reads it; the owner adds, edits, retires, imports. */
export function CatalogPage({ canEdit }: { canEdit: boolean }) {
  const [q, setQ] = useState("");
  const [kind, setKind] = useState<CatalogKind | "">("");
  const [includeInactive, setIncludeInactive] = useState(false);
  const [editing, setEditing] = useState<CatalogRecord | null>(null);
  const [isDialogOpen, setIsDialogOpen] = useState(false);
  const debouncedQ = useDebouncedValue(q);
  const query = useQuery(catalogQueries.list({ q: debouncedQ, kind, includeInactive }));
  const update = useUpdateCatalogItem();

  const onEdit = useCallback((item: CatalogRecord) => {
    setEditing(item);
    setIsDialogOpen(true);
  }, []);
  const { mutate } = update;
  const onToggleActive = useCallback(
    (item: CatalogRecord) =>
      mutate(
        { id: item.id, patch: { isActive: !item.isActive } },
        {
          onSuccess: (saved) =>
            toast.success(saved.isActive ? `${saved.name} is active again` : `${saved.name} retired`, {
              description: saved.isActive ? undefined : "Saved options that use it keep it. Show retired items to bring it back.",
            }),
          onError: (error) => toast.error("Not changed", { description: error.message }),
        },
      ),
    [mutate],
  );

  const isFiltered = debouncedQ.trim() !== "" || kind !== "";
  return (
    <>
      <PageHeader
        title="Catalog"
        description={
          canEdit
            ? "The vents, fans, accessories and labour you sell, with net free area ratings and prices. Design options price themselves from here."
            : "The vents, fans, accessories and labour the company sells. Only the owner changes items and prices."
        }
        actions={
          canEdit ? (
            <Button
              icon={<PlusIcon />}
              onClick={() => {
                setEditing(null);
                setIsDialogOpen(true);
              }}
            >
              Add item
            </Button>
          ) : null
        }
      />
      <div className="space-y-6">
        <div className="grid gap-3 sm:grid-cols-[1fr_16rem] md:grid-cols-[1fr_16rem_auto] md:items-end">
          <TextField
            label="Search"
            type="search"
            placeholder="Name or code"
            value={q}
            onChange={(e) => setQ(e.target.value)}
            trailing={<SearchIcon className="mr-3 text-ink-500" />}
          />
          <Select label="Kind" options={KIND_FILTER} value={kind} onChange={(e) => setKind(e.target.value as CatalogKind | "")} />
          <Checkbox label="Show retired items" checked={includeInactive} onChange={(e) => setIncludeInactive(e.target.checked)} className="md:pb-0" />
        </div>

        {query.isPending ? (
          <LoadingBlock label="Loading the catalog…" />
        ) : query.isError ? (
          <Alert severity="critical" title="Couldn't load the catalog">
            {query.error.message}
          </Alert>
        ) : query.data.length === 0 ? (
          <EmptyState
            icon={<BoxIcon />}
            title={isFiltered ? "No items match" : "The catalog is empty"}
            description={
              isFiltered
                ? "Try another word or kind."
                : canEdit
                  ? "Add ridge, soffit, box and powered vents with their rated net free area, your price and labour, or import a spreadsheet."
                  : "Only the company owner adds items and prices."
            }
          />
        ) : (
          <>
            <p className="text-sm text-ink-700" aria-live="polite">
              {query.data.length} item{query.data.length === 1 ? "" : "s"}
              {query.isFetching ? " · updating…" : ""} · cost and sell price are per unit sold (each, foot or hour)
            </p>
            <CatalogTable items={query.data} canEdit={canEdit} onEdit={onEdit} onToggleActive={onToggleActive} pendingId={update.isPending ? (update.variables?.id ?? null) : null} />
          </>
        )}

        <CatalogCsvPanel canImport={canEdit} />
      </div>
      {canEdit ? <CatalogItemDialog open={isDialogOpen} onOpenChange={setIsDialogOpen} item={editing} /> : null}
    </>
  );
}
