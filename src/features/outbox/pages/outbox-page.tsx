import { useQuery } from "@tanstack/react-query";
import { useSearchParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ChevronLeftIcon, InboxIcon, RefreshIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { cn } from "@/lib/cn";
import { formatDateTime } from "@/lib/format-date";
import { outboxQueries } from "../api/queries";
import type { OutboxMessage } from "../api/types";
import { MessageBody } from "../components/message-body";

function MessageList({
  messages,
  selectedId,
  onSelect,
}: {
  messages: OutboxMessage[];
  selectedId: string | null;
  onSelect: (id: string) => void;
}) {
  return (
    <ul aria-label="Sent e-mails" className="divide-y divide-ink-100 overflow-hidden rounded-lg border border-ink-200 bg-white shadow-card">
      {messages.map((message) => {
        const isSelected = message.id === selectedId;
        return (
          <li key={message.id}>
            <button
              type="button"
              onClick={() => onSelect(message.id)}
              aria-current={isSelected ? "true" : undefined}
              className={cn(
                "block w-full min-h-touch px-4 py-3 text-left hover:bg-ink-25 focus-visible:-outline-offset-3",
                isSelected && "bg-ember-50 shadow-[inset_4px_0_0_var(--color-ember-600,#B8470F)] hover:bg-ember-50",
              )}
            >
              <span className="block truncate font-semibold text-ink-900">{message.subject || "(no subject)"}</span>
              <span className="mt-0.5 flex flex-wrap justify-between gap-x-3 text-sm text-ink-600">
                <span className="truncate">To {message.to}</span>
                <time dateTime={message.createdAt} className="shrink-0 tabular-nums">
                  {formatDateTime(message.createdAt)}
                </time>
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
}

function MessageReader({ message, onBack }: { message: OutboxMessage; onBack: () => void }) {
  return (
    <article aria-labelledby="message-subject" className="space-y-4 rounded-lg border border-ink-200 bg-white p-4 shadow-card sm:p-6">
      <Button variant="ghost" size="sm" icon={<ChevronLeftIcon />} onClick={onBack} className="-ml-2 lg:hidden">
        All e-mails
      </Button>
      <header className="space-y-2">
        <h2 id="message-subject" className="text-xl font-semibold text-ink-900">
          {message.subject || "(no subject)"}
        </h2>
        <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-3 gap-y-1 text-sm">
          <dt className="font-medium text-ink-600">From</dt>
          <dd className="break-all text-ink-900">{message.from}</dd>
          <dt className="font-medium text-ink-600">To</dt>
          <dd className="break-all text-ink-900">{message.to}</dd>
          <dt className="font-medium text-ink-600">Sent</dt>
          <dd className="text-ink-900">
            <time dateTime={message.createdAt}>{formatDateTime(message.createdAt)}</time>
          </dd>
        </dl>
      </header>
      <MessageBody key={message.id} message={message} />
    </article>
  );
}

export function OutboxPage() {
  const outbox = useQuery(outboxQueries.list());
  const [searchParams, setSearchParams] = useSearchParams();
  const selectedId = searchParams.get("message");

  const select = (id: string | null) =>
    setSearchParams(
      (params) => {
        if (id) params.set("message", id);
        else params.delete("message");
        return params;
      },
      { replace: id === null },
    );

  const messages = outbox.data ?? [];
  const selected = messages.find((message) => message.id === selectedId) ?? null;

  return (
    <>
      <PageHeader
        title="Outbox"
        description="Every e-mail Eavesight has sent for your company: invites, password resets and proposals."
        actions={
          <Button
            variant="secondary"
            icon={<RefreshIcon />}
            onClick={() => outbox.refetch()}
            isLoading={outbox.isFetching && !outbox.isPending}
          >
            Refresh
          </Button>
        }
      />
      {outbox.isPending ? (
        <LoadingBlock label="Loading sent e-mails…" />
      ) : outbox.isError ? (
        <Alert severity="critical" title="Couldn't load the outbox">
          {outbox.error.message}
        </Alert>
      ) : messages.length === 0 ? (
        <EmptyState
          icon={<InboxIcon />}
          title="Nothing sent yet"
          description="When Eavesight sends an invite, a password reset or a proposal, a copy appears here so you can check what went out."
        />
      ) : (
        <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)] lg:items-start">
          <div className={cn(selected && "max-lg:hidden")}>
            <MessageList messages={messages} selectedId={selected?.id ?? null} onSelect={select} />
          </div>
          <div className={cn(!selected && "max-lg:hidden")}>
            {selected ? (
              <MessageReader message={selected} onBack={() => select(null)} />
            ) : (
              <p className="rounded-lg border border-dashed border-ink-300 bg-ink-25 px-6 py-12 text-center text-base text-ink-700">
                Choose an e-mail to read it.
              </p>
            )}
          </div>
        </div>
      )}
    </>
  );
}
