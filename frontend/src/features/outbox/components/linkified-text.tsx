import { Fragment } from 'react';

const URL_PATTERN = /(https?:\/\/[^\s<>"']+)/g;
// Sentence punctuation right after a link is almost never part of it.
const TRAILING = /[.,;:!?)\]]+$/;

/** Plain text with its http(s) addresses turned into links; nothing else is interpreted, so mail cannot inject markup. */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <>
      {parts.map((part, index) => {
        if (index % 2 === 0) return <Fragment key={index}>{part}</Fragment>;
        const trailing = part.match(TRAILING)?.[0] ?? '';
        const href = trailing ? part.slice(0, -trailing.length) : part;
        return (
          <Fragment key={index}>
            <a href={href} target="_blank" rel="noopener noreferrer" className="break-all text-copper-deep underline underline-offset-2 hover:text-copper">
              {href}
            </a>
            {trailing}
          </Fragment>
        );
      })}
    </>
  );
}
