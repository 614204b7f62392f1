import { useQuery } from "@tanstack/react-query";
import type { ColumnDef } from "@tanstack/react-table";
import { useEffect, useMemo, useState } from "react";
import { Link, useNavigation, useSearchParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { TextField } from "@/components/ui/field";
import { HouseIcon, PlusIcon, SearchIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { Table, TableContainer, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { Pagination, SortHeader } from "@/components/ui/table-controls";
import { formatDate } from "@/lib/format-date";
import { useServerTable } from "@/lib/use-server-table";
import { customerQueries } from "../api/queries";
import type { Customer, CustomerListParams, CustomerSort } from "../api/types";
import { CustomerFormDialog } from "../components/customer-form-dialog";
import { useDebouncedValue } from "@/lib/use-debounced-value";

const PAGE_SIZE = 25;
const SORTS: readonly CustomerSort[] = ["name", "createdAt", "updatedAt"];

export interface CustomersPageProps {
  canEdit: boolean;
  /** Sales may correct a customer's contact details (to send a proposal) but not add or delete customers. */
  canEditContact: boolean;
  /** Link to start a project for a customer (built by the route, so features stay apart). */
  newProjectHref: (customerId: string) => string;
}

function readParams(search: URLSearchParams): CustomerListParams {
  const sort = search.get("sort") as CustomerSort | null;
  const page = Number(search.get("page") ?? "1");
  return {
    q: search.get("q") ?? "",
    sort: sort && SORTS.includes(sort) ? sort : "name",
    dir: search.get("dir") === "desc" ? "desc" : "asc",
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    pageSize: PAGE_SIZE,
  };
}

export function CustomersPage({ canEdit, canEditContact, newProjectHref }: CustomersPageProps) {
  const [search, setSearch] = useSearchParams();
  const params = readParams(search);
  const [typed, setTyped] = useState(params.q);
  const debounced = useDebouncedValue(typed, 300);
  const navigation = useNavigation();
  const [editing, setEditing] = useState<Customer | null>(null);
  const [isAdding, setIsAdding] = useState(false);

  // Back/forward changes the URL: show its search text again (set while rendering, as React
  // advises for state that follows a changed input, rather than in an effect a render later).
  const [shownQ, setShownQ] = useState(params.q);
  if (shownQ !== params.q) {
    setShownQ(params.q);
    setTyped(params.q);
  }

  function update(next: Partial<CustomerListParams>) {
    const merged = { ...params, ...next };
    const out = new URLSearchParams();
    if (merged.q) out.set("q", merged.q);
    if (merged.sort !== "name") out.set("sort", merged.sort);
    if (merged.dir !== "asc") out.set("dir", merged.dir);
    if (merged.page > 1) out.set("page", String(merged.page));
    setSearch(out);
  }

  useEffect(() => {
    // A search that settles while the user is already leaving (a row was tapped and the next page
    // is loading) must not pull them back to the list.
    if (navigation.state !== "idle") return;
    if (debounced.trim() !== params.q.trim()) update({ q: debounced.trim(), page: 1 });
    // Only the debounced text drives this; `update` reads the latest params.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [debounced]);

  const list = useQuery(customerQueries.list(params));

  const columns = useMemo<ColumnDef<Customer>[]>(
    () => [
      { id: "name", header: "Name", enableSorting: true },
      { id: "contact", header: "Phone and e-mail", enableSorting: false },
      { id: "projects", header: "Projects", enableSorting: false },
      { id: "updatedAt", header: "Updated", enableSorting: true },
      { id: "actions", header: "Actions", enableSorting: false },
    ],
    [],
  );

  const table = useServerTable({ rows: list.data?.items, total: list.data?.total, columns, sort: params.sort, dir: params.dir, page: params.page, pageSize: PAGE_SIZE });

  function toggleSort(id: CustomerSort) {
    if (params.sort === id) update({ dir: params.dir === "asc" ? "desc" : "asc", page: 1 });
    else update({ sort: id, dir: id === "name" ? "asc" : "desc", page: 1 });
  }

  return (
    <>
      <PageHeader
        title="Customers"
        description="Homeowners and their contact details. Start a project from a customer for each visit."
        actions={
          canEdit ? (
            <Button icon={<PlusIcon />} onClick={() => setIsAdding(true)}>
              Add customer
            </Button>
          ) : null
        }
      />
      <div className="mb-4 max-w-md">
        <TextField
          label="Search customers"
          type="search"
          placeholder="Name, phone or e-mail"
          value={typed}
          onChange={(event) => setTyped(event.target.value)}
          autoComplete="off"
          trailing={<SearchIcon className="mr-3.5 text-ink-500" />}
        />
      </div>

      {list.isPending ? (
        <LoadingBlock label="Loading customers…" />
      ) : list.isError ? (
        <Alert severity="critical" title="Couldn't load customers">
          <p>{list.error.message}</p>
          <Button variant="secondary" size="sm" className="mt-3" onClick={() => list.refetch()}>
            Try again
          </Button>
        </Alert>
      ) : list.data.total === 0 ? (
        <EmptyState
          icon={<HouseIcon />}
          title={params.q ? `No customer matches "${params.q}"` : "No customers yet"}
          description={
            params.q
              ? "Check the spelling, or search by phone number or e-mail."
              : canEdit
                ? "Add the homeowner's name and contact details, then start a project at their address."
                : "Customers your estimators add will appear here."
          }
          action={
            canEdit && !params.q ? (
              <Button icon={<PlusIcon />} onClick={() => setIsAdding(true)}>
                Add customer
              </Button>
            ) : null
          }
        />
      ) : (
        <>
          <TableContainer className={list.isPlaceholderData ? "opacity-70" : undefined}>
            <Table>
              <caption className="sr-only">Customers, sorted by {params.sort === "name" ? "name" : "date"}</caption>
              <THead>
                {table.getHeaderGroups().map((group) => (
                  <tr key={group.id}>
                    {group.headers.map((header) => {
                      const id = header.column.id as CustomerSort;
                      const isSortable = header.column.columnDef.enableSorting;
                      const label = String(header.column.columnDef.header);
                      return (
                        <Th
                          key={header.id}
                          aria-sort={
                            params.sort === id ? (params.dir === "asc" ? "ascending" : "descending") : undefined
                          }
                        >
                          {header.column.id === "actions" ? (
                            <span className="sr-only">{label}</span>
                          ) : isSortable ? (
                            <SortHeader sorted={params.sort === id ? params.dir : false} onSort={() => toggleSort(id)}>
                              {label}
                            </SortHeader>
                          ) : (
                            label
                          )}
                        </Th>
                      );
                    })}
                  </tr>
                ))}
              </THead>
              <TBody>
                {table.getRowModel().rows.map((row) => {
                  const customer = row.original;
                  return (
                    <Tr key={row.id}>
                      <Td>
                        <button
                          type="button"
                          className="min-h-touch text-left font-semibold text-ink-900 underline decoration-ink-300 underline-offset-4 hover:decoration-ember-600 md:min-h-0"
                          onClick={() => setEditing(customer)}
                        >
                          {customer.name}
                        </button>
                        {customer.billingAddress ? (
                          <div className="text-sm text-ink-600">{customer.billingAddress}</div>
                        ) : null}
                      </Td>
                      <Td label="Phone and e-mail">
                        {customer.phone || customer.email ? (
                          <div className="space-y-0.5 text-sm">
                            {customer.phone ? <div>{customer.phone}</div> : null}
                            {customer.email ? <div className="break-all text-ink-700">{customer.email}</div> : null}
                          </div>
                        ) : (
                          <span className="text-sm text-ink-500">No contact details</span>
                        )}
                      </Td>
                      <Td label="Projects" isHalfOnPhone className="tabular-nums">
                        {customer.projectCount ?? 0}
                      </Td>
                      <Td label="Updated" isHalfOnPhone className="whitespace-nowrap">
                        {formatDate(customer.updatedAt)}
                      </Td>
                      <Td className="md:text-right">
                        {canEdit ? (
                          <Link
                            to={newProjectHref(customer.id)}
                            className={buttonStyles({ variant: "secondary", size: "sm", className: "max-md:w-full" })}
                          >
                            New project
                            <span className="sr-only"> for {customer.name}</span>
                          </Link>
                        ) : null}
                      </Td>
                    </Tr>
                  );
                })}
              </TBody>
            </Table>
          </TableContainer>
          <Pagination
            page={params.page}
            pageSize={PAGE_SIZE}
            total={list.data.total}
            noun="customers"
            isFetching={list.isFetching}
            onPageChange={(page) => update({ page })}
          />
        </>
      )}

      <CustomerFormDialog
        open={isAdding || editing !== null}
        onOpenChange={(open) => {
          if (!open) {
            setIsAdding(false);
            setEditing(null);
          }
        }}
        customer={editing}
        isReadOnly={editing ? !canEditContact : !canEdit}
        canDelete={canEdit}
      />
    </>
  );
}
