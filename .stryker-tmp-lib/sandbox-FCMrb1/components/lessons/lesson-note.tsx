// @ts-nocheck
// A step's note, written in Markdown by the instructor and shown to the class. Rendered safely:
// raw HTML is dropped (no rehype-raw), react-markdown's URL filter removes javascript: and other
// unsafe link targets, links open with rel="noopener noreferrer", and images are not shown.
import Markdown, { type Components } from "react-markdown";

const components: Components = {
  a: ({ href, children }) => (
    <a href={href} rel="noopener noreferrer" target="_blank" className="text-accent underline">
      {children}
    </a>
  ),
};

type LessonNoteProps = { markdown: string; className?: string };

export function LessonNote({ markdown, className = "" }: LessonNoteProps) {
  if (!markdown.trim()) return null;
  return (
    <div className={`lesson-note flex flex-col gap-3 [&_li]:ml-6 [&_ol]:list-decimal [&_ul]:list-disc [&_strong]:font-semibold [&_code]:rounded [&_code]:bg-bg [&_code]:px-1 ${className}`}>
      <Markdown skipHtml disallowedElements={["img"]} components={components}>
        {markdown}
      </Markdown>
    </div>
  );
}
