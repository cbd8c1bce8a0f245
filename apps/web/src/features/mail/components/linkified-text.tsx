import { Anchor } from '@mantine/core';
import { Fragment } from 'react';

const urlPattern = /(https?:\/\/[^\s<>"'`]+[^\s<>"'`.,;:!?)\]])/g;

function isSameOrigin(href: string) {
  try {
    return new URL(href).origin === window.location.origin;
  } catch {
    return false;
  }
}

/** Plain text with its web addresses made clickable; everything else stays text (no HTML is interpreted). */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(urlPattern);
  return (
    <>
      {parts.map((part, index) => {
        if (index % 2 === 0) return <Fragment key={index}>{part}</Fragment>;
        const internal = isSameOrigin(part);
        return (
          <Anchor key={index} href={part} {...(internal ? {} : { target: '_blank', rel: 'noopener noreferrer' })} className="lb-break">
            {part}
          </Anchor>
        );
      })}
    </>
  );
}
