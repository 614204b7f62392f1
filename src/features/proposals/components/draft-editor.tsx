import { useMemo, useState, type ReactNode } from "react";
import type { ProposalPatch } from "@shared/proposals/schemas";
import { PROPOSAL_LIMITS } from "@shared/proposals/limits";
import { formatCents } from "@shared/pricing/index";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { ConfirmDialog } from "@/components/ui/dialog";
import { Hint, TextArea, TextField } from "@/components/ui/field";
import { SeverityBadge } from "@/components/ui/badge";
import { getProposal } from "../api/get-proposal";
import type { ProjectAnalysis, ProjectOption, ProjectSummary, ProposalRecord, ProposalUpdateResult } from "../api/types";
import { updateProposal } from "../api/update-proposal";
import { fingerprint, useAutosave, type SaveState } from "@/lib/use-autosave";
import { depositFor, depositToRule, ruleToDraft, type DepositDraft } from "../lib/deposit";
import { SaveStatus } from "@/components/ui/save-status";

interface Draft {
  coverNote: string;
  terms: string;
  validUntil: string;
  deposit: DepositDraft;
  optionIds: string[];
  /** Scope text per option the salesperson has typed in (one line per sentence); others keep the server's lines. */
  editedScopes: Record<string, string>;
  photoIds: string[];
  /** null shows every finding. */
  findingCodes: string[] | null;
}

function draftOf(p: ProposalRecord): Draft {
  return {
    coverNote: p.coverNote ?? "",
    terms: p.terms ?? "",
    validUntil: p.validUntil,
    deposit: ruleToDraft(p.depositRule),
    optionIds: p.optionIds,
    editedScopes: {},
    photoIds: p.photoIds,
    findingCodes: p.findingCodes,
  };
}

type Payload = Omit<ProposalPatch, "version">;

function payloadOf(d: Draft): { payload: Payload | null; blocked: string | null } {
  if (d.optionIds.length === 0) return { payload: null, blocked: "choose at least one option." };
  if (!/^\d{4}-\d{2}-\d{2}$/.test(d.validUntil)) return { payload: null, blocked: "choose a validity date." };
  const deposit = depositToRule(d.deposit);
  if (!deposit.ok) return { payload: null, blocked: deposit.message };
  const scopes: Record<string, string[]> = {};
  for (const id of d.optionIds) {
    const text = d.editedScopes[id];
    if (text !== undefined) scopes[id] = text.split("\n").map((l) => l.trim()).filter(Boolean);
  }
  return {
    blocked: null,
    payload: {
      coverNote: d.coverNote.trim() === "" ? null : d.coverNote,
      terms: d.terms.trim() === "" ? null : d.terms,
      validUntil: d.validUntil,
      depositRule: deposit.value,
      optionIds: d.optionIds,
      ...(Object.keys(scopes).length > 0 ? { scopes } : {}),
      photoIds: d.photoIds,
      findingCodes: d.findingCodes,
    },
  };
}

export interface DraftEditorProps {
  proposal: ProposalRecord;
  project: ProjectSummary;
  options: ProjectOption[];
  analysis: ProjectAnalysis | undefined;
  onSaved: (result: ProposalUpdateResult) => void;
  /** The side column (PDF, signature, send), told whether everything is saved. */
  renderAside: (saveState: SaveState) => ReactNode;
  /** Reload the proposal from the server (after choosing "their" changes in a conflict). */
  onReload: () => void;
}

/** What is wrong with a scope's text against the limits the server checks, in words; undefined when it is fine. */
export function scopeProblem(text: string): string | undefined {
  const lines = text.split("\n").map((l) => l.trim()).filter(Boolean);
  if (lines.length > PROPOSAL_LIMITS.maxScopeLines) return `${lines.length} lines: keep it to ${PROPOSAL_LIMITS.maxScopeLines} (join related lines).`;
  const long = lines.findIndex((l) => l.length > PROPOSAL_LIMITS.maxScopeLineChars);
  if (long >= 0) return `Line ${long + 1} has ${lines[long]!.length} characters: keep each line to ${PROPOSAL_LIMITS.maxScopeLineChars} (split it in two).`;
  return undefined;
}

/** Everything a draft proposal says, saved as you type (with the version it was based on, like the survey). */
export function DraftEditor({ proposal, project, options, analysis, onSaved, renderAside, onReload }: DraftEditorProps) {
  const [server, setServer] = useState(proposal);
  const [draft, setDraft] = useState<Draft>(() => draftOf(proposal));
  const [isConflictOpen, setIsConflictOpen] = useState(false);
  const baseline = useMemo(() => fingerprint(payloadOf(draftOf(proposal)).payload), [proposal]);
  const { payload, blocked } = payloadOf(draft);

  const autosave = useAutosave<Payload, ProposalUpdateResult>({
    scopeId: `proposal:${proposal.id}`,
    payload,
    blockedReason: blocked,
    baseline,
    initialVersion: proposal.version,
    send: (body, version) => updateProposal(proposal.id, { ...body, version }),
    versionOf: (r) => r.proposal.version,
    onSaved: (result) => {
      setServer(result.proposal);
      onSaved(result);
    },
  });
  const state = autosave.state;

  const set = <K extends keyof Draft>(key: K, value: Draft[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const toggle = (list: string[], id: string, on: boolean) => (on ? [...list.filter((x) => x !== id), id] : list.filter((x) => x !== id));
  const depositRule = depositToRule(draft.deposit);

  const findings = useMemo(() => {
    const byCode = new Map<string, { code: string; title: string; severity: "critical" | "warning" | "info" }>();
    for (const s of analysis?.spaces ?? []) for (const f of s.analysis?.findings ?? []) if (!byCode.has(f.code)) byCode.set(f.code, { code: f.code, title: f.title, severity: f.severity });
    return [...byCode.values()];
  }, [analysis]);

  async function resolveConflict(choice: "theirs" | "mine") {
    const current = await getProposal(proposal.id);
    setIsConflictOpen(false);
    if (choice === "theirs") onReload();
    else autosave.resolve("mine", current.proposal.version, fingerprint(payloadOf(draftOf(current.proposal)).payload));
  }

  const scopeText = (id: string) => draft.editedScopes[id] ?? (server.scopes[id]?.lines ?? []).join("\n");

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem] lg:items-start">
    <div className="min-w-0 space-y-6">
      <div className="sticky top-14 z-10 rounded-lg border border-ink-200 bg-white/95 px-4 shadow-card backdrop-blur-sm md:top-16">
        <SaveStatus state={state} thing="proposal" onRetry={autosave.saveNow} onResolve={() => setIsConflictOpen(true)} />
      </div>

      <Card aria-labelledby="pb-options-title">
        <CardHeader>
          <CardTitle id="pb-options-title">Options to offer</CardTitle>
          <CardDescription>The homeowner chooses one of these. Prices come from the design options and the catalog.</CardDescription>
        </CardHeader>
        <CardBody className="space-y-1">
          {options.map((o) => {
            const isIn = draft.optionIds.includes(o.id);
            const total = o.price?.totalCents;
            return (
              <Checkbox
                key={o.id}
                data-option-choice={o.name}
                label={o.name}
                description={total !== undefined ? `Total ${formatCents(total)}` : (o.priceIssue ?? "No price yet")}
                checked={isIn}
                disabled={!isIn && draft.optionIds.length >= PROPOSAL_LIMITS.maxOptions}
                onChange={(e) => set("optionIds", toggle(draft.optionIds, o.id, e.target.checked))}
              />
            );
          })}
          {draft.optionIds.length === 0 ? <Hint className="text-warning-800">Choose at least one option.</Hint> : null}
          {options.length > PROPOSAL_LIMITS.maxOptions ? <Hint>At most {PROPOSAL_LIMITS.maxOptions} options in one proposal.</Hint> : null}
        </CardBody>
      </Card>

      <Card aria-labelledby="pb-letter-title">
        <CardHeader>
          <CardTitle id="pb-letter-title">Cover note and validity</CardTitle>
        </CardHeader>
        <CardBody className="space-y-5">
          <TextArea
            label="Cover note"
            isOptional
            rows={4}
            maxLength={PROPOSAL_LIMITS.maxCoverNoteChars}
            hint={`A few friendly lines to ${project.customer?.name ?? "the homeowner"}, shown first (at most ${PROPOSAL_LIMITS.maxCoverNoteChars.toLocaleString("en-US")} characters).`}
            value={draft.coverNote}
            onChange={(e) => set("coverNote", e.target.value)}
          />
          <TextField
            label="Valid until"
            type="date"
            className="max-w-xs"
            hint="After this date the link says the proposal has expired."
            value={draft.validUntil}
            onChange={(e) => set("validUntil", e.target.value)}
          />
        </CardBody>
      </Card>

      {draft.optionIds.map((id, index) => {
        const option = options.find((o) => o.id === id);
        const isEdited = draft.editedScopes[id] !== undefined || server.scopes[id]?.isEdited;
        return (
          <Card key={id} aria-labelledby={`pb-scope-${id}`}>
            <CardHeader>
              <CardTitle id={`pb-scope-${id}`}>
                Option {index + 1}: {option?.name ?? "Option"} — scope of work
              </CardTitle>
              <CardDescription>
                {isEdited ? "Edited by you." : "Written from the design option."} One sentence per line; the homeowner reads them as a list.
              </CardDescription>
            </CardHeader>
            <CardBody className="space-y-3">
              <TextArea
                label={`Scope of work for ${option?.name ?? "this option"}`}
                rows={Math.min(12, Math.max(4, scopeText(id).split("\n").length + 1))}
                hint={`At most ${PROPOSAL_LIMITS.maxScopeLines} lines of ${PROPOSAL_LIMITS.maxScopeLineChars} characters.`}
                error={scopeProblem(scopeText(id))}
                value={scopeText(id)}
                onChange={(e) => setDraft((d) => ({ ...d, editedScopes: { ...d.editedScopes, [id]: e.target.value } }))}
              />
              {option?.price ? (
                <p className="text-base text-ink-800">
                  Total <strong>{formatCents(option.price.totalCents)}</strong>
                  {depositRule.ok ? (
                    <>
                      {" "}
                      · deposit at signing{" "}
                      <strong>{formatCents(draft.deposit.mode === "company" ? option.price.deposit.depositCents : depositFor(option.price.totalCents, depositRule.value))}</strong>
                    </>
                  ) : null}
                </p>
              ) : null}
            </CardBody>
          </Card>
        );
      })}

      <Card aria-labelledby="pb-deposit-title">
        <CardHeader>
          <CardTitle id="pb-deposit-title">Deposit</CardTitle>
          <CardDescription>Some states cap home-improvement deposits (for example at the lesser of $1,000 or 10 %); local law decides.</CardDescription>
        </CardHeader>
        <CardBody className="space-y-4">
          <RadioGroup legend="Deposit for this proposal">
            {(
              [
                ["company", "As in the company profile"],
                ["none", "No deposit"],
                ["percent", "A percent of the total"],
                ["amount", "A fixed amount"],
              ] as const
            ).map(([mode, label]) => (
              <Radio key={mode} name="pb-deposit" value={mode} label={label} checked={draft.deposit.mode === mode} onChange={() => set("deposit", { ...draft.deposit, mode })} />
            ))}
          </RadioGroup>
          {draft.deposit.mode === "percent" || draft.deposit.mode === "amount" ? (
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField
                label={draft.deposit.mode === "percent" ? "Deposit percent" : "Deposit amount"}
                inputMode="decimal"
                trailing={<span className="pr-3.5 text-ink-600">{draft.deposit.mode === "percent" ? "%" : "$"}</span>}
                value={draft.deposit.value}
                error={!depositRule.ok ? depositRule.message : undefined}
                onChange={(e) => set("deposit", { ...draft.deposit, value: e.target.value })}
              />
              <TextField
                label="Never more than"
                isOptional
                hint="Dollars, like 1000."
                inputMode="decimal"
                trailing={<span className="pr-3.5 text-ink-600">$</span>}
                value={draft.deposit.cap}
                onChange={(e) => set("deposit", { ...draft.deposit, cap: e.target.value })}
              />
            </div>
          ) : null}
        </CardBody>
      </Card>

      <Card aria-labelledby="pb-evidence-title">
        <CardHeader>
          <CardTitle id="pb-evidence-title">What we found: findings and photos</CardTitle>
          <CardDescription>Choose what the homeowner sees in the summary of the attic today.</CardDescription>
        </CardHeader>
        <CardBody className="space-y-5">
          <fieldset className="space-y-1">
            <legend className="text-base font-semibold text-ink-900">Findings</legend>
            <Checkbox label="Show every finding" checked={draft.findingCodes === null} onChange={(e) => set("findingCodes", e.target.checked ? null : findings.map((f) => f.code))} />
            {draft.findingCodes !== null
              ? findings.map((f) => (
                  <Checkbox
                    key={f.code}
                    className="pl-6"
                    label={
                      <span className="inline-flex flex-wrap items-center gap-2">
                        <SeverityBadge severity={f.severity} /> {f.title}
                      </span>
                    }
                    checked={draft.findingCodes?.includes(f.code) ?? true}
                    onChange={(e) => set("findingCodes", toggle(draft.findingCodes ?? [], f.code, e.target.checked))}
                  />
                ))
              : null}
            {findings.length === 0 ? <Hint>No findings in the survey.</Hint> : null}
          </fieldset>
          <fieldset className="space-y-2">
            <legend className="text-base font-semibold text-ink-900">Photos</legend>
            {project.photos.length === 0 ? <Hint>No photos on this project yet.</Hint> : null}
            <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
              {project.photos.map((photo) => {
                const isIn = draft.photoIds.includes(photo.id);
                return (
                  <li key={photo.id}>
                    <label className="flex min-h-touch cursor-pointer flex-col gap-2 rounded-md border border-ink-300 p-2 has-checked:border-ember-600 has-checked:ring-1 has-checked:ring-ember-600">
                      <img src={photo.thumbUrl} alt="" className="aspect-[4/3] w-full rounded-sm bg-ink-100 object-cover" />
                      <span className="flex items-start gap-2 text-sm text-ink-900">
                        <input type="checkbox" className="mt-0.5 size-5 accent-ember-600" checked={isIn} onChange={(e) => set("photoIds", toggle(draft.photoIds, photo.id, e.target.checked))} />
                        {photo.caption ?? "Photo without a caption"}
                      </span>
                    </label>
                  </li>
                );
              })}
            </ul>
          </fieldset>
        </CardBody>
      </Card>

      <Card aria-labelledby="pb-terms-title">
        <CardHeader>
          <CardTitle id="pb-terms-title">Terms</CardTitle>
          <CardDescription>Copied from the company profile; change them for this proposal if needed.</CardDescription>
        </CardHeader>
        <CardBody>
          <TextArea
            label="Terms of this proposal"
            isOptional
            rows={6}
            maxLength={PROPOSAL_LIMITS.maxTermsChars}
            hint={`At most ${PROPOSAL_LIMITS.maxTermsChars.toLocaleString("en-US")} characters.`}
            value={draft.terms}
            onChange={(e) => set("terms", e.target.value)}
          />
        </CardBody>
      </Card>

      <ConfirmDialog
        open={isConflictOpen}
        onOpenChange={setIsConflictOpen}
        title="Someone else saved this proposal"
        description="Their changes were saved after you opened it. Keep yours (they replace theirs) or load theirs (your unsaved edits are dropped)."
        confirmLabel="Keep my changes"
        cancelLabel="Close"
        onConfirm={() => void resolveConflict("mine")}
      >
        <Button variant="secondary" onClick={() => void resolveConflict("theirs")}>
          Load their changes
        </Button>
      </ConfirmDialog>
    </div>
    <aside className="space-y-6" aria-label="Prepare and send">{renderAside(state)}</aside>
    </div>
  );
}
