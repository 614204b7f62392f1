import { flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type ColumnDef, type SortingState } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { formatCents } from "@shared/pricing/index";
import { formatNumber } from "@shared/units/format";
import { Badge, SeverityBadge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Table, TableContainer, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { SortHeader } from "@/components/ui/table-controls";
import type { CatalogRecord } from "../api/types";
import { kindLabel, UNIT_LABELS, UNIT_SHORT } from "../lib/labels";

export interface CatalogTableProps {
  items: CatalogRecord[];
  canEdit: boolean;
  onEdit: (item: CatalogRecord) => void;
  onToggleActive: (item: CatalogRecord) => void;
  pendingId: string | null;
}

function nfaText(item: CatalogRecord): string {
  if (item.nfaSqInPerFt !== null) return `${formatNumber(item.nfaSqInPerFt)} sq in/ft`;
  if (item.nfaSqInPerUnit !== null) return `${formatNumber(item.nfaSqInPerUnit)} sq in`;
  return "—";
}

/** The catalog as a sortable table (cards on phones). Prices come from integer cents. */
export function CatalogTable({ items, canEdit, onEdit, onToggleActive, pendingId }: CatalogTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo<ColumnDef<CatalogRecord>[]>(() => {
    const list: ColumnDef<CatalogRecord>[] = [
      {
        id: "name",
        header: "Item",
        accessorFn: (i) => i.name.toLowerCase(),
        cell: ({ row }) => (
          <div className="min-w-44">
            <span className="block font-semibold text-ink-900">{row.original.name}</span>
            <span className="block text-sm text-ink-600">{row.original.sku}</span>
          </div>
        ),
      },
      { id: "kind", header: "Kind", accessorFn: (i) => kindLabel(i.kind), cell: ({ getValue }) => String(getValue()) },
      { id: "unit", header: "Sold by", accessorFn: (i) => UNIT_LABELS[i.unit] + (i.soldInLengthFt ? ` (${formatNumber(i.soldInLengthFt)} ft pieces)` : "") },
      // One rating column (a vent has a net free area, a fan an airflow) and one price column keep Edit and Retire in view on a desk.
      {
        id: "rating",
        header: "Rating",
        accessorFn: (i) => i.nfaSqInPerFt ?? i.nfaSqInPerUnit ?? i.cfm ?? -1,
        cell: ({ row }) => (row.original.cfm !== null ? `${formatNumber(row.original.cfm)} cfm` : nfaText(row.original)),
      },
      {
        id: "price",
        header: "Sell / cost",
        accessorFn: (i) => i.sellPriceCents,
        cell: ({ row }) => (
          <span className="block">
            <span className="block font-semibold">
              {formatCents(row.original.sellPriceCents)}
              <span className="font-normal text-ink-600 md:sr-only"> {UNIT_SHORT[row.original.unit]}</span>
            </span>
            <span className="block text-sm text-ink-600">cost {formatCents(row.original.materialCostCents)}</span>
          </span>
        ),
      },
      { id: "labor", header: "Labour", accessorFn: (i) => i.laborMinutesPerUnit, cell: ({ row }) => `${formatNumber(row.original.laborMinutesPerUnit)} min` },
      {
        id: "active",
        header: "Status",
        accessorFn: (i) => (i.isActive ? 1 : 0),
        cell: ({ row }) =>
          row.original.isActive ? <SeverityBadge severity="ok">Active</SeverityBadge> : <Badge tone="outline">Retired</Badge>,
      },
    ];
    if (canEdit) {
      list.push({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <div className="flex gap-2 md:justify-end">
            <Button variant="secondary" size="sm" onClick={() => onEdit(row.original)} aria-label={`Edit ${row.original.name}`}>
              Edit
            </Button>
            <Button
              variant="ghost"
              size="sm"
              isLoading={pendingId === row.original.id}
              onClick={() => onToggleActive(row.original)}
              aria-label={`${row.original.isActive ? "Retire" : "Reactivate"} ${row.original.name}`}
            >
              {row.original.isActive ? "Retire" : "Reactivate"}
            </Button>
          </div>
        ),
      });
    }
    return list;
  }, [canEdit, onEdit, onToggleActive, pendingId]);

  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: items,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (row) => row.id,
  });

  const HALF = new Set(["kind", "unit", "rating", "price", "labor", "active"]);
  return (
    // relative: the sort buttons' screen-reader text is absolutely placed and must stay inside the scroll box.
    <TableContainer className="relative">
      <Table aria-label="Catalog items">
        <THead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <Th key={header.id} aria-sort={header.column.getIsSorted() === "asc" ? "ascending" : header.column.getIsSorted() === "desc" ? "descending" : undefined}>
                  {header.column.getCanSort() ? (
                    <SortHeader sorted={header.column.getIsSorted()} onSort={() => header.column.toggleSorting()}>
                      {flexRender(header.column.columnDef.header, header.getContext())}
                    </SortHeader>
                  ) : (
                    flexRender(header.column.columnDef.header, header.getContext())
                  )}
                </Th>
              ))}
            </tr>
          ))}
        </THead>
        <TBody>
          {table.getRowModel().rows.map((row) => (
            <Tr key={row.id} className={row.original.isActive ? undefined : "text-ink-600"}>
              {row.getVisibleCells().map((cell) => (
                <Td
                  key={cell.id}
                  label={cell.column.id === "name" || cell.column.id === "actions" ? undefined : String(cell.column.columnDef.header)}
                  isHalfOnPhone={HALF.has(cell.column.id)}
                  className={cell.column.id === "name" || cell.column.id === "kind" ? undefined : "md:whitespace-nowrap"}
                >
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </Td>
              ))}
            </Tr>
          ))}
        </TBody>
      </Table>
    </TableContainer>
  );
}
