/** The notebook pages, in menu order, with who each is for. */
export const PAGES = [
  { id: "compare", title: "Compare schemes", file: "compare.html", who: "project lead" },
  { id: "span-study", title: "Span study", file: "span-study.html", who: "project lead" },
  { id: "carbon", title: "Carbon factors", file: "carbon.html", who: "sustainability consultant" },
  { id: "rates", title: "Rates and on-costs", file: "rates.html", who: "cost adviser" },
  { id: "risk", title: "Risk", file: "risk.html", who: "project lead" },
  { id: "client", title: "Client view", file: "client.html", who: "client" },
  { id: "method", title: "Method and assumptions", file: "method.html", who: "everyone" },
] as const;

export type PageId = (typeof PAGES)[number]["id"];

export { CAUTION } from "../kernel/caution";
