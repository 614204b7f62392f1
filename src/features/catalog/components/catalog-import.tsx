import { useRef, useState, type ChangeEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Table, TableContainer, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { toast } from "@/components/ui/toaster";
import { useImportCatalog } from "../api/import-catalog";
import { CATALOG_EXPORT_URL } from "../api/queries";
import type { ImportResult } from "../api/types";

const MAX_FILE_BYTES = 1024 * 1024;

/** Column names as people read them in the report. */
const COLUMN_WORDS: Record<string, string> = {
  _: "Whole row",
  sku: "sku (code)",
  name: "name",
  kind: "kind",
  unit: "unit",
  nfaSqInPerUnit: "nfaSqInPerUnit (NFA per vent)",
  nfaSqInPerFt: "nfaSqInPerFt (NFA per foot)",
  cfm: "cfm",
  soldInLengthFt: "soldInLengthFt (piece length)",
  materialCostCents: "materialCostCents (cost, cents)",
  sellPriceCents: "sellPriceCents (price, cents)",
  laborMinutesPerUnit: "laborMinutesPerUnit",
  isActive: "isActive",
};

/** CSV export link and import with the per-row report (owner). All rows or none are imported. */
export function CatalogCsvPanel({ canImport }: { canImport: boolean }) {
  const fileRef = useRef<HTMLInputElement>(null);
  const importCatalog = useImportCatalog();
  const [fileName, setFileName] = useState<string | null>(null);
  const [result, setResult] = useState<ImportResult | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);

  async function onFile(event: ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = ""; // the same file may be picked again after it is fixed
    if (!file) return;
    setFileName(file.name);
    setResult(null);
    setFileError(null);
    if (file.size > MAX_FILE_BYTES) {
      setFileError("The file is larger than 1 MB. Split it into smaller files.");
      return;
    }
    const text = await file.text();
    importCatalog.mutate(text, {
      onSuccess: (r) => {
        setResult(r);
        if (r.errors.length === 0) toast.success(`Catalog imported: ${r.created} added, ${r.updated} updated`);
      },
      onError: (error) => setFileError(error.message),
    });
  }

  const badRows = result ? new Set(result.errors.map((e) => e.row)).size : 0;
  return (
    <Card>
      <CardHeader>
        <CardTitle>Spreadsheet (CSV)</CardTitle>
        <CardDescription>
          {canImport
            ? "Download the catalog, change it in a spreadsheet and import it back. Items are matched by code; money columns are in cents. If any row has a problem, nothing is imported."
            : "Download the catalog as a spreadsheet file."}
        </CardDescription>
      </CardHeader>
      <CardBody className="space-y-4">
        <div className="flex flex-col gap-3 sm:flex-row">
          <a href={CATALOG_EXPORT_URL} download="catalog.csv" className={buttonStyles({ variant: "secondary" })}>
            Download catalog (CSV)
          </a>
          {canImport ? (
            <>
              <input
                ref={fileRef}
                id="catalog-import-file"
                type="file"
                accept=".csv,text/csv"
                className="sr-only"
                aria-label="Catalog CSV file to import"
                onChange={(e) => void onFile(e)}
              />
              <Button variant="secondary" isLoading={importCatalog.isPending} loadingText="Importing…" onClick={() => fileRef.current?.click()}>
                Import a CSV file…
              </Button>
            </>
          ) : null}
        </div>
        {fileError ? (
          <Alert severity="critical" title={`${fileName ?? "The file"} was not imported`}>
            {fileError}
          </Alert>
        ) : null}
        {result && result.errors.length === 0 ? (
          <Alert severity="ok" title={`${fileName ?? "The file"} imported`}>
            {result.created} new item{result.created === 1 ? "" : "s"} added, {result.updated} updated.
          </Alert>
        ) : null}
        {result && result.errors.length > 0 ? (
          <div className="space-y-3" data-testid="import-report">
            <Alert severity="critical" title="Nothing was imported">
              {result.message ??
                `${badRows} row${badRows === 1 ? " has" : "s have"} problems. Fix ${badRows === 1 ? "it" : "them"} in the spreadsheet and import the file again.`}
            </Alert>
            <TableContainer className="relative">
              <Table aria-label="Problems found in the file">
                <THead>
                  <tr>
                    <Th className="w-20">Row</Th>
                    <Th className="w-64">Column</Th>
                    <Th>Problem</Th>
                  </tr>
                </THead>
                <TBody>
                  {result.errors.map((e, i) => (
                    <Tr key={`${e.row}-${e.field}-${i}`}>
                      <Td label="Row" isHalfOnPhone className="tabular-nums font-semibold">
                        {e.row}
                      </Td>
                      <Td label="Column" isHalfOnPhone>
                        {COLUMN_WORDS[e.field] ?? e.field}
                      </Td>
                      <Td label="Problem">{e.message}</Td>
                    </Tr>
                  ))}
                </TBody>
              </Table>
            </TableContainer>
            <p className="text-sm text-ink-600">Row numbers are as your spreadsheet shows them: the header is row 1.</p>
          </div>
        ) : null}
      </CardBody>
    </Card>
  );
}
