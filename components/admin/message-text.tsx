const URL_PATTERN = /(https?:\/\/[^\s]+)/g;

/** An e-mail's plain text with its addresses as links, so an admin can follow an invitation from the outbox. */
export function MessageText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <pre data-testid="message-text" className="overflow-x-auto whitespace-pre-wrap rounded-card border border-line bg-surface p-4 font-sans text-sm">
      {parts.map((part, index) =>
        // split() with a capturing group puts the matches at odd positions.
        index % 2 === 1 ? (
          <a key={index} href={part} className="text-tide underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}
