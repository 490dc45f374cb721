/** Plain text with its web addresses made into links, so a demo user can follow a confirmation link. */
export function LinkedText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <pre className="font-sans text-base break-words whitespace-pre-wrap">
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <a key={index} href={part} className="break-all">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}
