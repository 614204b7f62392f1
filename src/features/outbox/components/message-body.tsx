import { useState, type ReactNode } from "react";
import { cn } from "@/lib/cn";
import type { OutboxMessage } from "../api/types";

/*
 * The HTML body is untrusted as far as the page is concerned: it is shown in an iframe with an
 * empty-ish sandbox (no scripts, no same-origin, no forms), so it can't read cookies or the app.
 * Links open in a new tab (popups allowed) so a demo can follow an invite or reset link.
 */
function sandboxedDocument(html: string): string {
  return `<!doctype html><html><head><meta charset="utf-8"><base target="_blank">
<meta http-equiv="Content-Security-Policy" content="default-src 'none'; img-src data: https: http:; style-src 'unsafe-inline'; font-src data:">
<style>body{font-family:system-ui,sans-serif;font-size:16px;line-height:1.5;color:#171C24;margin:16px;word-wrap:break-word}</style>
</head><body>${html}</body></html>`;
}

const URL_PATTERN = /(https?:\/\/[^\s<>"')]+)/g;

/** Plain text with http(s) links made clickable; everything else stays text (no HTML parsing). */
function linkify(text: string): ReactNode[] {
  return text.split(URL_PATTERN).map((part, index) =>
    index % 2 === 1 ? (
      <a
        key={index}
        href={part}
        target="_blank"
        rel="noopener noreferrer"
        className="font-medium break-all text-ember-700 underline underline-offset-2"
      >
        {part}
      </a>
    ) : (
      part
    ),
  );
}

type View = "html" | "text";

export function MessageBody({ message }: { message: OutboxMessage }) {
  const hasHtml = Boolean(message.html);
  const hasText = Boolean(message.text);
  const [view, setView] = useState<View>(hasHtml ? "html" : "text");
  const current: View = view === "html" && !hasHtml ? "text" : view;

  return (
    <div className="space-y-3">
      {hasHtml && hasText ? (
        <div role="group" aria-label="Show the message as" className="inline-flex rounded-md border border-ink-300 bg-white p-1">
          {(["html", "text"] as const).map((option) => (
            <button
              key={option}
              type="button"
              aria-pressed={current === option}
              onClick={() => setView(option)}
              className={cn(
                "h-9 rounded px-3 text-sm font-medium pointer-coarse:h-touch",
                current === option ? "bg-ink-900 text-white" : "text-ink-700 hover:bg-ink-100",
              )}
            >
              {option === "html" ? "Formatted" : "Plain text"}
            </button>
          ))}
        </div>
      ) : null}
      {current === "html" && message.html ? (
        <iframe
          title={`Message: ${message.subject}`}
          sandbox="allow-popups allow-popups-to-escape-sandbox"
          referrerPolicy="no-referrer"
          srcDoc={sandboxedDocument(message.html)}
          className="h-[28rem] w-full rounded-md border border-ink-200 bg-white lg:h-[36rem]"
        />
      ) : hasText ? (
        <pre className="overflow-x-auto rounded-md border border-ink-200 bg-white p-4 font-sans text-base whitespace-pre-wrap text-ink-900">
          {linkify(message.text ?? "")}
        </pre>
      ) : (
        <p className="text-base text-ink-600">This message has no body.</p>
      )}
    </div>
  );
}
