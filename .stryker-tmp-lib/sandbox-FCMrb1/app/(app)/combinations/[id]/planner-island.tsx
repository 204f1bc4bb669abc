// @ts-nocheck
"use client";
// The planner's own code (calc with its zod schemas, the form library, the editor) is the bulk
// of the page's JavaScript. The server renders the whole planner into the page; loading it through
// this dynamic import keeps it out of the page's first scripts: the shell (navigation, theme)
// hydrates at once, the browser fetches the planner's code straight away (preloaded) and hydrates
// the planner when it arrives. Until then the figures, the chart's first frame and the ladder are
// already on screen from the server's HTML.
import dynamic from "next/dynamic";

export const PlannerIsland = dynamic(() => import("./planner").then((m) => m.Planner));
