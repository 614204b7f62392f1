import { useRef, useState, type DragEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cn } from "@/lib/cn";
import { formatDateTime } from "@/lib/format-date";
import { useCheckDocument } from "../api/check-document";
import { verdictOf } from "../lib/verdict";

const isPdf = (file: File) => file.type === "application/pdf" || /\.pdf$/i.test(file.name);

/**
 * The public check (no account): anyone holding a proposal or change order PDF chooses or drops it
 * and reads, in plain words, whether it is the signed original, which document it is and when it
 * was signed. Its address is printed in every PDF's footer and on the signing certificate.
 */
export function VerifyPage() {
  const check = useCheckDocument();
  const inputRef = useRef<HTMLInputElement>(null);
  const resultRef = useRef<HTMLDivElement>(null);
  const [fileName, setFileName] = useState<string | null>(null);
  const [notPdf, setNotPdf] = useState<string | null>(null);
  const [isDragging, setIsDragging] = useState(false);

  function start(file: File | undefined) {
    if (!file) return;
    setFileName(file.name);
    check.reset();
    if (!isPdf(file)) {
      setNotPdf(file.name);
      return;
    }
    setNotPdf(null);
    check.mutate(file, {
      // The answer appears below the button: take the keyboard and the screen reader there.
      onSettled: () => requestAnimationFrame(() => resultRef.current?.focus()),
    });
  }
  function onDrop(e: DragEvent<HTMLDivElement>) {
    e.preventDefault();
    setIsDragging(false);
    start(e.dataTransfer.files[0]);
  }

  const verdict = check.data ? verdictOf(check.data, formatDateTime) : null;
  return (
    <div className="min-h-dvh bg-ink-25">
      <title>Check a proposal or change order</title>
      <header className="border-b border-ink-200 bg-white">
        <div className="mx-auto max-w-3xl px-4 py-3 sm:px-6">
          <p className="text-lg leading-tight font-semibold text-ink-900">Document check</p>
        </div>
      </header>
      <main className="mx-auto max-w-3xl space-y-6 px-4 py-6 sm:px-6 sm:py-10">
        <div className="space-y-3">
          <h1 className="text-3xl font-semibold tracking-tight text-ink-900">Is this the document that was signed?</h1>
          <p className="text-lg text-ink-800">
            Choose the proposal or change order PDF you were given. We compare its fingerprint with the one recorded when the document was sent or signed, and tell you which
            document it is and when it was signed.
          </p>
        </div>

        <div
          className={cn(
            "flex flex-col items-center gap-3 rounded-lg border-2 border-dashed px-4 py-8 text-center",
            isDragging ? "border-ember-600 bg-ember-50" : "border-ink-300 bg-white",
          )}
          onDragOver={(e) => {
            e.preventDefault();
            setIsDragging(true);
          }}
          onDragLeave={() => setIsDragging(false)}
          onDrop={onDrop}
          data-drop-zone
        >
          <input
            ref={inputRef}
            type="file"
            accept="application/pdf,.pdf"
            className="hidden"
            tabIndex={-1}
            aria-hidden="true"
            onChange={(e) => {
              start(e.target.files?.[0]);
              e.target.value = "";
            }}
          />
          <Button size="lg" onClick={() => inputRef.current?.click()} isLoading={check.isPending} loadingText="Checking…">
            {fileName ? "Check another PDF" : "Choose the PDF"}
          </Button>
          <p className="text-base text-ink-700">or drop the file here</p>
          {fileName ? (
            <p className="max-w-full text-base break-all text-ink-800">
              File: <span className="font-medium">{fileName}</span>
            </p>
          ) : null}
        </div>

        <div ref={resultRef} tabIndex={-1} aria-live="polite" className="space-y-3 outline-offset-4" data-verify-result={verdict ? (check.data?.matches ? "match" : "no-match") : undefined}>
          {notPdf ? (
            <Alert severity="warning" title="That file is not a PDF">
              Proposals and change orders are PDF files (their names end in .pdf). Choose the PDF attached to the e-mail, or the one you downloaded.
            </Alert>
          ) : null}
          {check.isError ? (
            <Alert severity="warning" title="The file could not be checked">
              {check.error.message}
            </Alert>
          ) : null}
          {verdict && check.data ? (
            <>
              <Alert severity={verdict.tone} title={verdict.title} isAssertive={false}>
                <div className="space-y-2">
                  {verdict.details.map((line) => (
                    <p key={line}>{line}</p>
                  ))}
                </div>
              </Alert>
              <p className="text-sm break-all text-ink-700">Fingerprint (SHA-256) of your file: <span className="font-mono">{check.data.sha256}</span></p>
            </>
          ) : null}
        </div>

        <section aria-labelledby="how-title" className="space-y-2 border-t border-ink-200 pt-6 text-base text-ink-800">
          <h2 id="how-title" className="text-xl font-semibold text-ink-900">
            How the check works
          </h2>
          <p>
            Every PDF has a fingerprint (a SHA-256 hash) that changes if even one character of the file changes. The company records the fingerprint of each proposal and
            change order when it is sent, and of the signed copy when it is signed.
          </p>
          <p>
            Where your browser can, the fingerprint is worked out on this device and only the fingerprint is sent; the document itself stays with you. A match tells you which
            document it is; no match tells you nothing about anyone else&apos;s documents.
          </p>
          <p>A printed page, a scan or a file saved again from a PDF viewer will not match, even when it reads the same: check the file exactly as you received it.</p>
        </section>
      </main>
    </div>
  );
}
