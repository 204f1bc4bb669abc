// @ts-nocheck
// A step's note is the instructor's Markdown shown to a whole class: it must never run script,
// carry a javascript: link or load an image from elsewhere. Rendered on the server, as in the app.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { LessonNote } from "@/components/lessons/lesson-note";

const render = (markdown: string) => renderToStaticMarkup(createElement(LessonNote, { markdown }));

describe("lesson note Markdown", () => {
  it("renders ordinary Markdown: emphasis, lists and safe links with rel=noopener noreferrer", () => {
    const html = render("Boost **falls**.\n\n- heads\n- cam\n\nSee [the shop](https://example.com/a).");
    expect(html).toContain("<strong>falls</strong>");
    expect(html).toMatch(/<ul>\s*<li>heads<\/li>/);
    expect(html).toMatch(/<a href="https:\/\/example.com\/a" rel="noopener noreferrer"/);
  });

  it("drops raw HTML: no script element, no event handler attribute", () => {
    const html = render('Before\n\n<script>alert("x")</script>\n\nAfter <img src=x onerror="alert(1)"> and <b onclick="alert(2)">bold</b>');
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/onerror|onclick/i);
    expect(html).not.toMatch(/<img/i);
    expect(html).toContain("Before");
    expect(html).toContain("After");
  });

  it("removes javascript: and data: link targets but keeps the link text", () => {
    const html = render("[click me](javascript:alert(1)) and [also](JaVaScRiPt:alert(2)) and [data](data:text/html;base64,PHNjcmlwdD4=)");
    expect(html).not.toMatch(/javascript:/i);
    expect(html).not.toMatch(/data:text/i);
    expect(html).toContain("click me");
    expect(html).toContain("also");
  });

  it("shows no images, even Markdown ones", () => {
    const html = render("![a chart](https://example.com/tracker.png)");
    expect(html).not.toMatch(/<img/i);
    expect(html).not.toContain("tracker.png");
  });

  it("renders nothing for an empty note", () => {
    expect(render("   ")).toBe("");
  });
});
