import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import { formatNumber } from "@shared/units/format";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ChevronLeftIcon, ClipboardIcon, OkIcon, WarningIcon } from "@/components/ui/icons";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { formatDate } from "@/lib/format-date";
import type { OptionMaterials } from "../api/types";
import { optionQueries } from "../api/queries";

/*
 * Printing: only the sheet is printed (navigation and buttons hidden), black on white. The app
 * shell is not ours to change, so the sheet hides everything else while printing.
 */
const PRINT_CSS = `
@media print {
  @page { margin: 14mm; }
  body { background: #fff !important; }
  body * { visibility: hidden !important; }
  #materials-sheet, #materials-sheet * { visibility: visible !important; color: #000 !important; background: transparent !important; box-shadow: none !important; }
  #materials-sheet { position: absolute; inset: 0 auto auto 0; width: 100%; max-width: none !important; padding: 0 !important; border: 0 !important; }
  #materials-sheet .no-print { display: none !important; }
  #materials-sheet table, #materials-sheet th, #materials-sheet td { border-color: #000 !important; }
  #materials-sheet tr, #materials-sheet li { break-inside: avoid; }
}`;

/** Whether the crew may work from this list: printed with it, so a paper copy says so too. */
function ReleaseBanner({ release }: { release: OptionMaterials["release"] }) {
  if (release) {
    return (
      <p data-release="released" className="flex items-start gap-2 rounded-md border-2 border-ok-600 bg-ok-50 px-3 py-2 text-base font-semibold text-ok-900">
        <OkIcon className="mt-0.5 size-5 shrink-0 text-ok-600" />
        <span>
          Released to the crew on {formatDate(release.releasedAt)} (accepted proposal rev. {release.revision}
          {release.changeOrders.length ? `, with signed change order${release.changeOrders.length > 1 ? "s" : ""} ${release.changeOrders.join(", ")}` : ""})
        </span>
      </p>
    );
  }
  return (
    <p data-release="not-released" className="flex items-start gap-2 rounded-md border-2 border-dashed border-ink-500 bg-ink-50 px-3 py-2 text-base font-semibold text-ink-900">
      <WarningIcon className="mt-0.5 size-5 shrink-0 text-ink-600" />
      <span>Not released — this option has not been accepted</span>
    </p>
  );
}

/** The crew's list for one option: what to buy (rounded to how it's sold) and the work to do. */
export function MaterialsPage({ projectId, optionId }: { projectId: string; optionId: string }) {
  const query = useQuery(optionQueries.materials(optionId));
  if (query.isPending) return <LoadingBlock label="Working out the materials…" />;
  if (query.isError) return <EmptyState icon={<ClipboardIcon />} title="Couldn't load the materials list" description={query.error.message} />;
  const { option, project, spaces, materials, release } = query.data;
  const spaceName = (id: string | null) => (id ? (spaces.find((s) => s.id === id)?.name ?? null) : null);

  return (
    <div id="materials-sheet" className="mx-auto max-w-reading space-y-6 bg-white p-4 text-ink-950 sm:rounded-lg sm:border sm:border-ink-200 sm:p-8">
      <style>{PRINT_CSS}</style>
      <title>{`Materials · ${option.name} · Eavesight`}</title>
      <div className="no-print flex flex-wrap items-center justify-between gap-3">
        <Link to={paths.app.projectOption.getHref(projectId, optionId)} className="inline-flex min-h-touch items-center gap-1 text-sm font-medium text-ink-700 hover:text-ink-900">
          <ChevronLeftIcon className="size-4" /> Back to the option
        </Link>
        <Button onClick={() => window.print()}>Print</Button>
      </div>
      <header className="space-y-1 border-b-2 border-ink-900 pb-3">
        <p className="text-sm font-semibold tracking-wide uppercase">Materials list</p>
        <h1 className="text-2xl font-semibold">{option.name}</h1>
        <p className="text-base">
          {project.title} · {project.siteAddress}
        </p>
        <p className="text-sm text-ink-700">
          {release ? "The list as signed: later edits to the option, the catalog or the survey do not change it. " : `Option version ${option.version}. `}
          Quantities are rounded up to what is bought.
        </p>
      </header>
      <ReleaseBanner release={release} />

      <section aria-labelledby="buy-title" className="space-y-2">
        <h2 id="buy-title" className="text-lg font-semibold">
          To bring
        </h2>
        {materials.items.length === 0 ? (
          <p>No catalog materials in this option.</p>
        ) : (
          <table className="w-full border-collapse text-left text-base">
            <thead>
              <tr className="border-b border-ink-900">
                <th scope="col" className="py-2 pr-3 font-semibold">Item</th>
                <th scope="col" className="py-2 pr-3 text-right font-semibold">Buy</th>
                <th scope="col" className="hidden py-2 font-semibold sm:table-cell">Worked out</th>
              </tr>
            </thead>
            <tbody>
              {materials.items.map((line) => (
                <tr key={line.catalogItemId} className="border-b border-ink-300 align-top" data-material={line.sku}>
                  <td className="py-2 pr-3">
                    <span className="block font-medium">{line.name}</span>
                    <span className="block text-sm text-ink-700">{line.sku}</span>
                    <span className="block text-sm text-ink-700 sm:hidden">{line.explanation}</span>
                  </td>
                  <td className="py-2 pr-3 text-right whitespace-nowrap">
                    <span className="text-lg font-semibold tabular-nums">{formatNumber(line.buyCount)}</span> {line.buyUnit}
                  </td>
                  <td className="hidden py-2 text-sm text-ink-800 sm:table-cell">{line.explanation}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      <section aria-labelledby="work-title" className="space-y-2">
        <h2 id="work-title" className="text-lg font-semibold">
          Work to do
        </h2>
        {materials.work.length === 0 ? (
          <p>No removal, patch or labour lines.</p>
        ) : (
          <ol className="list-decimal space-y-3 pl-6">
            {materials.work.map((w, i) => (
              <li key={i} className="space-y-1">
                <p>
                  {spaceName(w.spaceId) ? <span className="font-semibold">{spaceName(w.spaceId)}: </span> : null}
                  {w.description}
                </p>
                {w.caution ? (
                  <p className="flex gap-2 border-l-4 border-ink-900 pl-2 text-sm">
                    <WarningIcon className="mt-0.5 size-4 shrink-0" />
                    <span>
                      <span className="font-semibold">Caution: </span>
                      {w.caution}
                    </span>
                  </p>
                ) : null}
              </li>
            ))}
          </ol>
        )}
      </section>
      <p className="border-t border-ink-300 pt-3 text-sm">
        Follow local codes, the authority having jurisdiction and the manufacturers' instructions. Electrical work by a licensed electrician.
      </p>
    </div>
  );
}
