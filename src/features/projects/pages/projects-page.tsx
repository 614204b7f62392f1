import { useQuery } from "@tanstack/react-query";
import type { ColumnDef } from "@tanstack/react-table";
import { useEffect, useMemo, useState } from "react";
import { Link, useNavigation, useSearchParams } from "react-router";
import { PROJECT_STATUSES, type ProjectStatus } from "@shared/schemas/projects";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button, buttonStyles } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { TextField } from "@/components/ui/field";
import { ClipboardIcon, PlusIcon, SearchIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Select } from "@/components/ui/select";
import { LoadingBlock } from "@/components/ui/spinner";
import { Table, TableContainer, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { Pagination, SortHeader } from "@/components/ui/table-controls";
import { paths } from "@/config/paths";
import { formatDate } from "@/lib/format-date";
import { useServerTable } from "@/lib/use-server-table";
import { projectQueries } from "../api/queries";
import type { ProjectListItem, ProjectListParams, ProjectSort } from "../api/types";
import { useDebouncedValue } from "@/lib/use-debounced-value";
import { STATUS_LABELS, STATUS_OPTIONS } from "../lib/project-options";

const PAGE_SIZE = 25;
const SORTS: readonly ProjectSort[] = ["updatedAt", "createdAt", "title", "customerName", "status"];
const TEXT_SORTS: readonly ProjectSort[] = ["title", "customerName", "status"];

function readParams(search: URLSearchParams): ProjectListParams {
  const sort = search.get("sort") as ProjectSort | null;
  const status = search.get("status") as ProjectStatus | null;
  const page = Number(search.get("page") ?? "1");
  const validSort = sort && SORTS.includes(sort) ? sort : "updatedAt";
  const dir = search.get("dir");
  return {
    q: search.get("q") ?? "",
    status: status && PROJECT_STATUSES.includes(status) ? status : "",
    estimatorId: search.get("estimator") ?? "",
    sort: validSort,
    dir: dir === "asc" || dir === "desc" ? dir : TEXT_SORTS.includes(validSort) ? "asc" : "desc",
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    pageSize: PAGE_SIZE,
  };
}

function writeParams(params: ProjectListParams): URLSearchParams {
  const out = new URLSearchParams();
  if (params.q) out.set("q", params.q);
  if (params.status) out.set("status", params.status);
  if (params.estimatorId) out.set("estimator", params.estimatorId);
  if (params.sort !== "updatedAt") out.set("sort", params.sort);
  const defaultDir = TEXT_SORTS.includes(params.sort) ? "asc" : "desc";
  if (params.dir !== defaultDir) out.set("dir", params.dir);
  if (params.page > 1) out.set("page", String(params.page));
  return out;
}

export interface ProjectsPageProps {
  canCreate: boolean;
  /** "Good to see you, Dale." */
  greeting?: string;
  companyName: string;
}

/** Every project of the company: search, filter by status and estimator, sort, page. The URL holds it all. */
export function ProjectsPage({ canCreate, greeting, companyName }: ProjectsPageProps) {
  const [search, setSearch] = useSearchParams();
  const params = readParams(search);
  const [typed, setTyped] = useState(params.q);
  const debounced = useDebouncedValue(typed, 300);
  const navigation = useNavigation();
  const estimators = useQuery(projectQueries.estimators());
  const list = useQuery(projectQueries.list(params));

  // Back/forward changes the URL: show its search text again (set while rendering, as React
  // advises for state that follows a changed input, rather than in an effect a render later).
  const [shownQ, setShownQ] = useState(params.q);
  if (shownQ !== params.q) {
    setShownQ(params.q);
    setTyped(params.q);
  }

  function update(next: Partial<ProjectListParams>, options: { replace?: boolean } = {}) {
    setSearch(writeParams({ ...params, ...next }), options);
  }

  useEffect(() => {
    // Typing replaces the history entry, so Back goes to the last finished search, not every keystroke.
    // A search that settles while the user is already leaving (a row was tapped and the next page
    // is loading) must not pull them back to the list.
    if (navigation.state !== "idle") return;
    if (debounced.trim() !== params.q.trim()) update({ q: debounced.trim(), page: 1 }, { replace: params.q !== "" });
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [debounced]);

  function toggleSort(id: ProjectSort) {
    if (params.sort === id) update({ dir: params.dir === "asc" ? "desc" : "asc", page: 1 });
    else update({ sort: id, dir: TEXT_SORTS.includes(id) ? "asc" : "desc", page: 1 });
  }

  const columns = useMemo<ColumnDef<ProjectListItem>[]>(
    () => [
      { id: "title", header: "Project", enableSorting: true },
      { id: "customerName", header: "Customer", enableSorting: true },
      { id: "status", header: "Status", enableSorting: true },
      { id: "estimator", header: "Estimator", enableSorting: false },
      { id: "spaces", header: "Attic spaces", enableSorting: false },
      { id: "updatedAt", header: "Updated", enableSorting: true },
    ],
    [],
  );
  const table = useServerTable({ rows: list.data?.items, total: list.data?.total, columns, sort: params.sort, dir: params.dir, page: params.page, pageSize: PAGE_SIZE });

  const estimatorOptions = (estimators.data ?? []).map((e) => ({ value: e.id, label: e.name }));
  const isFiltered = Boolean(params.q || params.status || params.estimatorId);

  return (
    <>
      <PageHeader
        eyebrow={companyName}
        title="Projects"
        description={greeting ?? "Every job site, its attic survey and where it stands."}
        actions={
          canCreate ? (
            <Link to={paths.app.newProject.getHref()} className={buttonStyles({ className: "max-md:w-full" })}>
              <PlusIcon />
              New project
            </Link>
          ) : null
        }
      />
      <div className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)]">
        <TextField
          label="Search projects"
          type="search"
          placeholder="Title, address or customer"
          value={typed}
          autoComplete="off"
          onChange={(event) => setTyped(event.target.value)}
          trailing={<SearchIcon className="mr-3.5 text-ink-500" />}
          className="sm:col-span-2 lg:col-span-1"
        />
        <Select
          label="Status"
          options={STATUS_OPTIONS}
          placeholder="Any status"
          value={params.status}
          onChange={(event) => update({ status: event.target.value as ProjectStatus | "", page: 1 })}
        />
        <Select
          label="Estimator"
          options={estimatorOptions}
          placeholder="Anyone"
          value={params.estimatorId}
          onChange={(event) => update({ estimatorId: event.target.value, page: 1 })}
        />
      </div>

      {list.isPending ? (
        <LoadingBlock label="Loading projects…" />
      ) : list.isError ? (
        <Alert severity="critical" title="Couldn't load projects">
          <p>{list.error.message}</p>
          <Button variant="secondary" size="sm" className="mt-3" onClick={() => list.refetch()}>
            Try again
          </Button>
        </Alert>
      ) : list.data.total === 0 ? (
        <EmptyState
          icon={<ClipboardIcon />}
          title={isFiltered ? "No project matches" : "No projects yet"}
          description={
            isFiltered
              ? "Try fewer words, another status or another estimator."
              : "Each project holds a customer's site, its attic spaces with measurements, vents and photos, and the ventilation check."
          }
          action={
            isFiltered ? (
              <Button variant="secondary" onClick={() => setSearch(new URLSearchParams())}>
                Clear search and filters
              </Button>
            ) : canCreate ? (
              <Link to={paths.app.newProject.getHref()} className={buttonStyles()}>
                <PlusIcon />
                New project
              </Link>
            ) : null
          }
        />
      ) : (
        <>
          <TableContainer className={list.isPlaceholderData ? "opacity-70 transition-opacity" : undefined}>
            <Table>
              <caption className="sr-only">Projects</caption>
              <THead>
                {table.getHeaderGroups().map((group) => (
                  <tr key={group.id}>
                    {group.headers.map((header) => {
                      const id = header.column.id as ProjectSort;
                      const label = String(header.column.columnDef.header);
                      return (
                        <Th
                          key={header.id}
                          aria-sort={params.sort === id ? (params.dir === "asc" ? "ascending" : "descending") : undefined}
                        >
                          {header.column.columnDef.enableSorting ? (
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
                  const p = row.original;
                  return (
                    <Tr key={row.id}>
                      <Td>
                        <Link
                          to={paths.app.project.getHref(p.id)}
                          className="inline-flex min-h-touch items-center font-semibold text-ink-900 underline decoration-ink-300 underline-offset-4 hover:decoration-ember-600 md:min-h-0"
                        >
                          {p.title}
                        </Link>
                        <div className="text-sm text-ink-600">{p.siteAddress}</div>
                      </Td>
                      <Td label="Customer" isHalfOnPhone>
                        {p.customer.name}
                      </Td>
                      <Td label="Status" isHalfOnPhone>
                        <Badge tone={p.status === "sold" || p.status === "completed" ? "brand" : "neutral"}>
                          {STATUS_LABELS[p.status]}
                        </Badge>
                      </Td>
                      <Td label="Estimator" isHalfOnPhone>
                        {p.estimator?.name ?? <span className="text-ink-500">Not assigned</span>}
                      </Td>
                      <Td label="Attic spaces" isHalfOnPhone className="tabular-nums">
                        {p.spaceCount}
                      </Td>
                      <Td label="Updated" isHalfOnPhone className="whitespace-nowrap">
                        {formatDate(p.updatedAt)}
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
            noun="projects"
            isFetching={list.isFetching}
            onPageChange={(page) => {
              update({ page });
              window.scrollTo({ top: 0 });
            }}
          />
        </>
      )}
    </>
  );
}
