import { effect } from "@preact/signals-core";
import { PAGES, CAUTION, type PageId } from "./pages";
import { createStudyStore, type StudyStore } from "./study-store";
import { studyFileText } from "../study";
import { studyFilePicker } from "./file-picker";
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
  const brand = document.createElement("a");
  brand.className = "brand";
  brand.href = "./index.html";
  brand.textContent = "spanbook";
  const nav = document.createElement("nav");
  nav.setAttribute("aria-label", "Pages");
  for (const page of PAGES) {
    const a = document.createElement("a");
    a.href = `./${page.file}`;
    a.textContent = page.title;
    if (page.id === options.id) a.setAttribute("aria-current", "page");
    nav.append(a);
  }
  header.append(brand, nav);

  const main = document.createElement("main");
  main.className = "notebook";
  const title = document.createElement("h1");
  title.textContent = meta.title;
  const intro = document.createElement("p");
  intro.className = "intro";
  intro.textContent = options.intro;
  const caution = document.createElement("p");
  caution.className = "caution";
  caution.setAttribute("role", "note");
  caution.textContent = CAUTION;
  const notice = document.createElement("pre");
  notice.className = "notice";
  notice.setAttribute("role", "status");
  effect(() => {
    notice.textContent = store.notice.value;
    notice.hidden = store.notice.value === "";
  });
  main.append(title, intro, caution, notice, bannerList(store));
  main.append(studyTools(store, options.readOnly ?? false));
  document.body.replaceChildren(header, main);
  return { store, main };
}

/** The store's banners (a study kept as a backup, another tab's change), each with its actions and a dismiss button. */
function bannerList(store: StudyStore): HTMLElement {
  const list = document.createElement("div");
  list.className = "banners";
  const dismissed = new Set<string>();
  effect(() => {
    const shown = store.banners.value.filter((b) => !dismissed.has(`${b.id}:${b.text}`));
    list.replaceChildren(
      ...shown.map((banner) => {
        const box = document.createElement("div");
        box.className = "notice banner";
        box.dataset.banner = banner.id;
        box.setAttribute("role", "alert");
        const text = document.createElement("p");
        text.textContent = banner.text;
        const close = button("Dismiss", () => {
          dismissed.add(`${banner.id}:${banner.text}`);
          box.remove();
        });
        box.append(text, ...banner.actions.map((a) => button(a.label, a.run)), close);
        return box;
      }),
    );
  });
  return list;
}

function button(label: string, onClick: () => void): HTMLButtonElement {
  const b = document.createElement("button");
  b.type = "button";
  b.textContent = label;
  b.addEventListener("click", onClick);
  return b;
}

/** Open / save / copy-link tools for the study (read-only pages: open only). An invalid file changes nothing and says why. */
function studyTools(store: StudyStore, readOnly: boolean): HTMLElement {
  const bar = document.createElement("div");
  bar.className = "study-tools";
  const name = document.createElement("span");
  name.className = "study-title";
  effect(() => {
    name.textContent = `Study: ${store.study.value.meta.title}`;
  });
  const [open, file] = studyFilePicker({
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
  });
  const save = button("Save study file", () => {
    const slug = store.study.value.meta.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "study";
    downloadText(`${slug}.spanbook.json`, studyFileText(store.study.value), "application/json");
  });
  const copy = button("Copy link", async () => {
    const url = `${location.origin}${location.pathname}${store.link.value}`;
    try {
      await navigator.clipboard.writeText(url);
      store.notice.value = "Link copied: it reopens this study.";
    } catch {
      store.notice.value = `Copy this link to share the study:\n${url}`;
    }
  });
  bar.append(name, ...(open && file ? [open, file] : []), ...(readOnly ? [] : [save, copy]));
  return bar;
}
