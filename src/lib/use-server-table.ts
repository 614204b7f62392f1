import { getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";

/**
 * A TanStack table whose rows are one page the server already searched, sorted and cut: the
 * table only lays out columns and reports sort and page state (both held in the URL by the page).
 */
export function useServerTable<Row extends { id: string }>(opts: {
  rows: Row[] | undefined;
  total: number | undefined;
  columns: ColumnDef<Row>[];
  sort: string;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}) {
  // No React Compiler here; TanStack Table re-renders through its own state, which is what we want.
  // eslint-disable-next-line react-hooks/incompatible-library
  return useReactTable({
    data: opts.rows ?? [],
    columns: opts.columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    rowCount: opts.total ?? 0,
    state: {
      sorting: [{ id: opts.sort, desc: opts.dir === "desc" }],
      pagination: { pageIndex: opts.page - 1, pageSize: opts.pageSize },
    },
    getRowId: (row) => row.id,
  });
}
