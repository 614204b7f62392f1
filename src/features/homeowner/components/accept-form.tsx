import { useState, type FormEvent } from "react";
import type { AcceptInput } from "@shared/proposals/schemas";
import { formatCents } from "@shared/pricing/index";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { FieldError, TextField } from "@/components/ui/field";
import { isApiError } from "@/lib/api-client";
import { useAcceptProposal } from "../api/accept-proposal";
import type { PublicProposal } from "../api/types";
import { SignatureCanvas } from "@/components/ui/signature-canvas";

type Errors = Partial<Record<"optionId" | "signerName" | "signature" | "consent", string>>;

export interface AcceptFormProps {
  token: string;
  view: PublicProposal;
  /** The chosen option (chosen here or with an option's "Choose" button above); "" when none yet. */
  optionId: string;
  onOptionChange: (optionId: string) => void;
  /** Called once the acceptance is recorded, so the page can bring the confirmation into view. */
  onAccepted?: () => void;
}

/** Accept one option: choose it, give your full name, sign (drawn or typed), and agree to sign electronically. */
export function AcceptForm({ token, view, optionId, onOptionChange: setOptionId, onAccepted }: AcceptFormProps) {
  const accept = useAcceptProposal(token);
  const [signerName, setSignerName] = useState("");
  const [mode, setMode] = useState<"draw" | "type">("draw");
  const [drawn, setDrawn] = useState<string | null>(null);
  const [typed, setTyped] = useState("");
  const [hasConsent, setHasConsent] = useState(false);
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const chosenIndex = view.options.findIndex((o) => o.id === optionId);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const found: Errors = {};
    if (!optionId) found.optionId = "Choose the option you want.";
    if (!signerName.trim()) found.signerName = "Enter your full name.";
    if (mode === "draw" && !drawn) found.signature = "Draw your signature in the box, or choose to type it.";
    if (mode === "type" && !typed.trim()) found.signature = "Type your name to sign.";
    if (!hasConsent) found.consent = "Please tick the box to agree to sign electronically.";
    setErrors(found);
    if (Object.keys(found).length > 0) {
      setFormError("A few things are still needed: see the notes below.");
      return;
    }
    const input: AcceptInput = {
      optionId,
      signerName: signerName.trim(),
      signature: mode === "draw" ? { drawnPngDataUrl: drawn! } : { typed: typed.trim() },
      consent: { esign: true, consentTextVersion: view.esign.version },
    };
    accept.mutate(input, {
      onSuccess: () => onAccepted?.(),
      onError: (error) => {
        if (!isApiError(error)) return setFormError("Something went wrong. Please try again.");
        const f = error.fields;
        setErrors({
          optionId: f.optionId,
          signerName: f.signerName,
          signature: f["signature.typed"] ?? f["signature.drawnPngDataUrl"] ?? f.signature,
          consent: f["consent.esign"] ?? f["consent.consentTextVersion"],
        });
        setFormError(error.message);
      },
    });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" aria-labelledby="accept-title">
      <h3 id="accept-title" tabIndex={-1} className="scroll-mt-4 text-xl font-semibold text-ink-900 focus:outline-none">
        Accept and sign
      </h3>
      {formError ? (
        <Alert severity="critical" isAssertive>
          {formError}
        </Alert>
      ) : null}

      <RadioGroup legend="1. Which option do you choose?" error={errors.optionId}>
        {view.options.map((o, i) => (
          <Radio
            key={o.id}
            name="accept-option"
            value={o.id}
            label={`Option ${i + 1}: ${o.name}`}
            description={o.price ? `${formatCents(o.price.totalCents)} · deposit ${formatCents(o.price.depositCents)}` : undefined}
            checked={optionId === o.id}
            onChange={() => setOptionId(o.id)}
          />
        ))}
      </RadioGroup>

      <TextField label="2. Your full name" autoComplete="name" value={signerName} onChange={(e) => setSignerName(e.target.value)} error={errors.signerName} className="max-w-md" />

      <fieldset className="space-y-3">
        <legend className="text-base font-medium text-ink-900">3. Your signature</legend>
        <RadioGroup legend={<span className="sr-only">How do you want to sign?</span>} isInline>
          <Radio name="sign-mode" value="draw" label="Draw it" description="With a finger, pen or mouse" checked={mode === "draw"} onChange={() => setMode("draw")} />
          <Radio name="sign-mode" value="type" label="Type it" description="Your typed name is your signature" checked={mode === "type"} onChange={() => setMode("type")} />
        </RadioGroup>
        {mode === "draw" ? (
          <SignatureCanvas label="Signature box: draw your signature here. To use the keyboard, choose Type it." onChange={setDrawn} />
        ) : (
          <TextField label="Type your name to sign" value={typed} onChange={(e) => setTyped(e.target.value)} inputClassName="font-serif text-xl italic" className="max-w-md" />
        )}
        <FieldError>{errors.signature}</FieldError>
      </fieldset>

      <section aria-labelledby="esign-title" className="space-y-3 rounded-md border border-ink-300 bg-ink-25 p-4">
        <h4 id="esign-title" className="text-base font-semibold text-ink-900">
          4. Signing electronically
        </h4>
        <div className="space-y-2 text-base text-ink-800" data-esign-text>
          {view.esign.text.map((p) => (
            <p key={p}>{p}</p>
          ))}
        </div>
        <p className="text-sm text-ink-600">Consent text version {view.esign.version}</p>
        <Checkbox
          label="I agree to sign electronically and to receive this proposal and its records electronically."
          checked={hasConsent}
          onChange={(e) => setHasConsent(e.target.checked)}
          error={errors.consent}
        />
      </section>

      {view.coolingOff.isEnabled ? (
        <p className="text-base text-ink-800">
          <strong>Your right to cancel:</strong> you may cancel within three business days of signing, without penalty. The notice and the form
          are further down this page and in your signed PDF.
        </p>
      ) : null}

      <Button type="submit" size="lg" className="w-full sm:w-auto" isLoading={accept.isPending} loadingText="Signing…">
        {chosenIndex >= 0 ? `Accept option ${chosenIndex + 1} and sign` : "Accept and sign"}
      </Button>
    </form>
  );
}
