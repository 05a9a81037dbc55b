/**
 * Plain text with its http(s) addresses made clickable. Links to `appOrigin` become relative, so
 * they open in the app as it runs now even when the message was written for another port.
 */
export function LinkedText({ text, appOrigin }: { text: string; appOrigin: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"')]+)/g);
  return (
    <>
      {parts.map((part, i) => {
        if (i % 2 === 0) return part;
        let href = part;
        try {
          const url = new URL(part);
          if (url.origin === appOrigin) href = url.pathname + url.search + url.hash;
        } catch {
          /* not a URL after all: keep the text as the href */
        }
        return (
          <a key={i} href={href} className="break-all text-pine-700 underline">
            {part}
          </a>
        );
      })}
    </>
  );
}
