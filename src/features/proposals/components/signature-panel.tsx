import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Radio, RadioGroup } from "@/components/ui/checkbox";
import { TextField } from "@/components/ui/field";
import { LoadingBlock } from "@/components/ui/spinner";
import { toast } from "@/components/ui/toaster";
import { isApiError } from "@/lib/api-client";
import { proposalQueries } from "../api/queries";
import { useSaveSignature } from "../api/save-signature";
import type { SellerSignature } from "../api/types";
import { SignatureCanvas } from "@/components/ui/signature-canvas";

export function SignaturePreview({ signature, name }: { signature: SellerSignature; name: string }) {
  return signature.drawnPngDataUrl ? (
    <img src={signature.drawnPngDataUrl} alt={`Drawn signature of ${name}`} className="h-20 max-w-full rounded-md border border-ink-200 bg-white object-contain p-1" />
  ) : (
    <p className="rounded-md border border-ink-200 bg-white px-3 py-3 font-serif text-2xl text-ink-900 italic" aria-label={`Typed signature: ${signature.typed ?? ""}`}>
      {signature.typed}
    </p>
  );
}

/** The seller's signature, kept on their profile and copied into each proposal they send. */
export function SignaturePanel({ userName }: { userName: string }) {
  const query = useQuery(proposalQueries.signature());
  const save = useSaveSignature();
  const [isEditing, setIsEditing] = useState(false);
  const [mode, setMode] = useState<"draw" | "type">("draw");
  const [drawn, setDrawn] = useState<string | null>(null);
  const [typed, setTyped] = useState(userName);
  const [error, setError] = useState<string | null>(null);

  if (query.isPending) return <LoadingBlock label="Loading your signature…" className="py-4" />;
  if (query.isError) return <Alert severity="critical">{query.error.message}</Alert>;
  const saved = query.data;

  if (saved && !isEditing) {
    return (
      <div className="space-y-3" data-seller-signature="saved">
        <SignaturePreview signature={saved} name={userName} />
        <p className="text-sm text-ink-600">Saved on your profile and used for every proposal you send.</p>
        <Button variant="secondary" size="sm" onClick={() => setIsEditing(true)}>
          Change my signature
        </Button>
      </div>
    );
  }

  function onSave() {
    setError(null);
    const input = mode === "draw" ? (drawn ? { drawnPngDataUrl: drawn } : null) : typed.trim() ? { typed: typed.trim() } : null;
    if (!input) {
      setError(mode === "draw" ? "Draw your signature in the box first." : "Type your name to sign.");
      return;
    }
    save.mutate(input, {
      onSuccess: () => {
        setIsEditing(false);
        toast.success("Signature saved");
      },
      onError: (e) => setError(isApiError(e) ? (Object.values(e.fields)[0] ?? e.message) : "The signature could not be saved."),
    });
  }

  return (
    <div className="space-y-4" data-seller-signature="editing">
      {!saved ? <p className="text-base text-ink-700">Sign once; your signature is kept on your profile for every proposal you send.</p> : null}
      <RadioGroup legend="How do you want to sign?" isInline>
        <Radio name="seller-sign-mode" value="draw" label="Draw" checked={mode === "draw"} onChange={() => setMode("draw")} />
        <Radio name="seller-sign-mode" value="type" label="Type my name" checked={mode === "type"} onChange={() => setMode("type")} />
      </RadioGroup>
      {mode === "draw" ? (
        <SignatureCanvas label="Your signature: draw with a finger, pen or mouse. To use the keyboard, choose Type my name." onChange={setDrawn} />
      ) : (
        <TextField label="Your name as signature" value={typed} onChange={(e) => setTyped(e.target.value)} autoComplete="name" />
      )}
      {error ? <Alert severity="critical">{error}</Alert> : null}
      <div className="flex flex-wrap gap-3">
        <Button onClick={onSave} isLoading={save.isPending} loadingText="Saving…">
          Save my signature
        </Button>
        {saved ? (
          <Button variant="ghost" onClick={() => setIsEditing(false)}>
            Keep the saved one
          </Button>
        ) : null}
      </div>
    </div>
  );
}
