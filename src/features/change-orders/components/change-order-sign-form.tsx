import { useState, type FormEvent } from "react";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { FieldError, TextArea, TextField } from "@/components/ui/field";
import { SignatureCanvas } from "@/components/ui/signature-canvas";
import { isApiError } from "@/lib/api-client";
import { declineChangeOrder, signChangeOrder } from "../api/change-orders";
import { changeOrderKeys } from "../api/queries";
import type { PublicChangeOrder } from "../api/types";

type Errors = Partial<Record<"signerName" | "signature" | "consent", string>>;

/** Sign a change order as the proposal is signed: full name, drawn or typed signature, the same e-sign consent. Or decline it. */
export function ChangeOrderSignForm({ token, view }: { token: string; view: PublicChangeOrder }) {
  const queryClient = useQueryClient();
  const onAnswered = (data: PublicChangeOrder) => queryClient.setQueryData(changeOrderKeys.public(token), data);
  const sign = useMutation({ mutationFn: signChangeOrder, onSuccess: onAnswered });
  const decline = useMutation({ mutationFn: declineChangeOrder, onSuccess: onAnswered });
  const [signerName, setSignerName] = useState("");
  const [mode, setMode] = useState<"draw" | "type">("type");
  const [drawn, setDrawn] = useState<string | null>(null);
  const [typed, setTyped] = useState("");
  const [hasConsent, setHasConsent] = useState(false);
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [isDeclining, setIsDeclining] = useState(false);
  const [declineReason, setDeclineReason] = useState("");
  const { number } = view.changeOrder;

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const found: Errors = {};
    if (!signerName.trim()) found.signerName = "Enter your full name.";
    if (mode === "draw" && !drawn) found.signature = "Draw your signature in the box, or choose to type it.";
    if (mode === "type" && !typed.trim()) found.signature = "Type your name to sign.";
    if (!hasConsent) found.consent = "Please tick the box to agree to sign electronically.";
    setErrors(found);
    if (Object.keys(found).length > 0) return setFormError("A few things are still needed: see the notes below.");
    sign.mutate(
      { token, input: { signerName: signerName.trim(), signature: mode === "draw" ? { drawnPngDataUrl: drawn! } : { typed: typed.trim() }, consent: { esign: true, consentTextVersion: view.snapshot.esign.version } } },
      {
        onError: (error) => {
          if (!isApiError(error)) return setFormError("Something went wrong. Please try again.");
          const f = error.fields;
          setErrors({ signerName: f.signerName, signature: f["signature.typed"] ?? f["signature.drawnPngDataUrl"], consent: f["consent.esign"] ?? f["consent.consentTextVersion"] });
          setFormError(error.message);
        },
      },
    );
  }

  return (
    <div className="space-y-6">
      <form onSubmit={onSubmit} noValidate className="space-y-5" aria-labelledby="co-sign-title">
        <h2 id="co-sign-title" className="text-xl font-semibold text-ink-900">
          Sign change order {number}
        </h2>
        {formError ? <Alert severity="critical" isAssertive>{formError}</Alert> : null}
        <TextField label="1. Your full name" autoComplete="name" value={signerName} onChange={(e) => setSignerName(e.target.value)} error={errors.signerName} className="max-w-md" />
        <fieldset className="space-y-3">
          <legend className="text-base font-medium text-ink-900">2. Your signature</legend>
          <RadioGroup legend={<span className="sr-only">How do you want to sign?</span>} isInline>
            <Radio name="co-sign-mode" value="type" label="Type it" description="Your typed name is your signature" checked={mode === "type"} onChange={() => setMode("type")} />
            <Radio name="co-sign-mode" value="draw" label="Draw it" description="With a finger, pen or mouse" checked={mode === "draw"} onChange={() => setMode("draw")} />
          </RadioGroup>
          {mode === "draw" ? (
            <SignatureCanvas label="Signature box: draw your signature here. To use the keyboard, choose Type it." onChange={setDrawn} />
          ) : (
            <TextField label="Type your name to sign" value={typed} onChange={(e) => setTyped(e.target.value)} inputClassName="font-serif text-xl italic" className="max-w-md" />
          )}
          <FieldError>{errors.signature}</FieldError>
        </fieldset>
        <section aria-labelledby="co-esign-title" className="space-y-3 rounded-md border border-ink-300 bg-ink-25 p-4">
          <h3 id="co-esign-title" className="text-base font-semibold text-ink-900">3. Signing electronically</h3>
          <div className="space-y-2 text-base text-ink-800">
            {view.snapshot.esign.text.map((p) => <p key={p}>{p}</p>)}
          </div>
          <p className="text-sm text-ink-600">Consent text version {view.snapshot.esign.version}</p>
          <Checkbox label="I agree to sign electronically and to receive this change order and its records electronically." checked={hasConsent} onChange={(e) => setHasConsent(e.target.checked)} error={errors.consent} />
        </section>
        <Button type="submit" size="lg" className="w-full sm:w-auto" isLoading={sign.isPending} loadingText="Signing…">
          Sign change order {number}
        </Button>
      </form>
      <section aria-label="Decline" className="space-y-3 border-t border-ink-200 pt-4">
        {isDeclining ? (
          <>
            <TextArea label="Why not? (optional)" rows={2} value={declineReason} onChange={(e) => setDeclineReason(e.target.value)} />
            <div className="flex flex-wrap gap-2">
              <Button variant="secondary" isLoading={decline.isPending} onClick={() => decline.mutate({ token, reason: declineReason.trim() || null })}>
                Decline change order {number}
              </Button>
              <Button variant="ghost" onClick={() => setIsDeclining(false)}>Keep it open</Button>
            </div>
            {decline.isError ? <Alert severity="critical">{decline.error.message}</Alert> : null}
          </>
        ) : (
          <Button variant="ghost" onClick={() => setIsDeclining(true)}>I don't want this change</Button>
        )}
        <p className="text-sm text-ink-700">If you decline, the work you signed stays exactly as it is.</p>
      </section>
    </div>
  );
}
