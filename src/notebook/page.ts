// The page frame as preact components (issue 11 item 5): the title bar with the page menu, then the
// title, intro, caution, the store's notice and banners, and the study tools. Each part reads the
// store's signals in its render, so it redraws when they change and holds no effect of its own.
import { h, render, Fragment, type ComponentChild } from "preact";
import { useSignal } from "@preact/signals";
import { PAGES, CAUTION, type PageId } from "./pages";
import { createStudyStore, type Banner, type StudyStore } from "./study-store";
import { studyFileText } from "../study";
import { StudyFilePicker } from "./file-picker";
import { downloadText } from "./download";

export interface Page {
  store: StudyStore;
  /** Where the page's cells go. */
  main: HTMLElement;
}

export interface PageOptions {
  id: PageId;
  /** The demo study (parsed JSON) opened when there is no link and nothing saved. */
  demoStudy: unknown;
  /** Read-only pages (the client's view) do not save and show no study tools. */
  readOnly?: boolean;
  /** One paragraph under the title: what the page is for. */
  intro: string;
}

/**
 * Lays out a notebook page: title bar with the page menu, the caution, the study tools (open,
 * save, link) and an empty main column for cells. Returns the study store the cells read.
 */
export function startPage(options: PageOptions): Page {
  const meta = PAGES.find((p) => p.id === options.id);
  if (!meta) throw new Error(`unknown page: ${options.id}`);
  document.title = `${meta.title} · spanbook`;
  const store = createStudyStore({ initial: options.demoStudy, persist: !options.readOnly });

  const header = document.createElement("header");
  header.className = "page-header";
  render(h(PageMenu, { current: options.id }), header);
  const main = document.createElement("main");
  main.className = "notebook";
  const top = document.createElement("div");
  top.className = "page-top";
  render(h(PageTop, { title: meta.title, intro: options.intro, store, readOnly: options.readOnly ?? false }), top);
  main.append(top);
  document.body.replaceChildren(header, main);
  return { store, main };
}

function PageMenu({ current }: { current: PageId }): ComponentChild {
  return h(Fragment, null, [
    h("a", { className: "brand", href: "./index.html" }, "spanbook"),
    h(
      "nav",
      { "aria-label": "Pages" },
      PAGES.map((page) => h("a", { key: page.id, href: `./${page.file}`, "aria-current": page.id === current ? "page" : undefined }, page.title)),
    ),
  ]);
}

function PageTop({ title, intro, store, readOnly }: { title: string; intro: string; store: StudyStore; readOnly: boolean }): ComponentChild {
  return h(Fragment, null, [
    h("h1", null, title),
    h("p", { className: "intro" }, intro),
    h("p", { className: "caution", role: "note" }, CAUTION),
    h(Notice, { store }),
    h(BannerList, { store }),
    h(StudyTools, { store, readOnly }),
  ]);
}

/** The store's message about loading and saving; hidden while there is none. */
function Notice({ store }: { store: StudyStore }): ComponentChild {
  const notice = store.notice.value;
  return h("pre", { className: "notice", role: "status", hidden: notice === "" }, notice);
}

/** The store's banners (a study kept as a backup, another tab's change), each with its actions and a dismiss button. */
function BannerList({ store }: { store: StudyStore }): ComponentChild {
  const dismissed = useSignal<ReadonlySet<string>>(new Set());
  const keyOf = (b: Banner) => `${b.id}:${b.text}`;
  const shown = store.banners.value.filter((b) => !dismissed.value.has(keyOf(b)));
  return h(
    "div",
    { className: "banners" },
    shown.map((banner) =>
      h("div", { key: keyOf(banner), className: "notice banner", "data-banner": banner.id, role: "alert" }, [
        h("p", null, banner.text),
        ...banner.actions.map((a) => h("button", { type: "button", onClick: a.run }, a.label)),
        h("button", { type: "button", onClick: () => (dismissed.value = new Set([...dismissed.value, keyOf(banner)])) }, "Dismiss"),
      ]),
    ),
  );
}

/** The study's title: its own component, so an edit redraws this line alone. */
function StudyTitle({ store }: { store: StudyStore }): ComponentChild {
  return h("span", { className: "study-title" }, `Study: ${store.study.value.meta.title}`);
}

/** Open / save / copy-link tools for the study (read-only pages: open only). An invalid file changes nothing and says why. */
function StudyTools({ store, readOnly }: { store: StudyStore; readOnly: boolean }): ComponentChild {
  const save = () => {
    const slug = store.study.peek().meta.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "study";
    downloadText(`${slug}.spanbook.json`, studyFileText(store.study.peek()), "application/json");
  };
  const copy = async () => {
    const url = `${location.origin}${location.pathname}${store.link.peek()}`;
    try {
      await navigator.clipboard.writeText(url);
      store.notice.value = "Link copied: it reopens this study.";
    } catch {
      store.notice.value = `Copy this link to share the study:\n${url}`;
    }
  };
  return h("div", { className: "study-tools" }, [
    h(StudyTitle, { store }),
    h(StudyFilePicker, {
      label: "Open study file…",
      inputLabel: "Study file to open",
      onStudy: (study, fileName) => {
        const problems = store.replace(study);
        if (problems === null) store.origin.value = `file ${fileName}`;
        store.notice.value = problems === null ? `Opened ${fileName}.` : `${fileName} was not opened; nothing changed:\n${problems}`;
      },
      onRefused: (message) => {
        store.notice.value = message;
      },
    }),
    ...(readOnly
      ? []
      : [h("button", { type: "button", onClick: save }, "Save study file"), h("button", { type: "button", onClick: () => void copy() }, "Copy link")]),
  ]);
}
