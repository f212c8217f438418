// Importing a CSV into an editable table: a whole table replaces the current one; a file that
// lacks rows the schemes need is refused with their names, and can instead be merged into the
// current table as a partial update after a preview listing every change. Nothing is applied
// until the user applies it; the table set's name (provenance for captions) changes in the same update.
import { CsvError, listProblems } from "../catalogue";
import { mergeRows, importedSetName, type RowMerge, type ForgivingRead } from "../carbon";
import { messageOf } from "../kernel/errors";

/** A row the schemes need that a table lacks, with the schemes that need it. */
export type RowGap = { key: string; neededBy: readonly string[] };

export type ImportOptions<R extends Record<string, unknown>> = {
  id: string;
  rowNoun: string;
  keyField: keyof R & string;
  columns: readonly { field: keyof R & string; label: string }[];
  current: () => R[];
  parseCsv(text: string, fileLabel: string): R[];
  /** A forgiving reader (delimiter, decimal comma, header variants, partial columns); parseCsv is used without it. */
  read?: (text: string, fileLabel: string, current: readonly R[]) => ForgivingRead<R>;
  /** Rows the schemes need that these rows lack. */
  missingFor?: (rows: readonly R[]) => RowGap[];
  /** Applies rows with the name of the set they form (one study update). */
  apply(rows: R[], setName: string | null): void;
  /** The current set name, for a merge's new name. */
  currentName?: () => string;
};

const MAX_LISTED = 50;

function button(label: string, id: string, onClick: () => void): HTMLButtonElement {
  const b = document.createElement("button");
  b.type = "button";
  b.id = id;
  b.textContent = label;
  b.addEventListener("click", onClick);
  return b;
}

const today = () => new Date().toISOString().slice(0, 10);

function show(value: unknown): string {
  const text = typeof value === "string" ? JSON.stringify(value) : String(value);
  return text.length > 60 ? `${text.slice(0, 59)}…` : text;
}

/** The lines a merge preview lists: added rows, each changed field (old → new), and the unchanged count. */
export function mergeLines<R extends Record<string, unknown>>(merge: RowMerge<R>, labelOf: (field: string) => string): string[] {
  const lines = [
    ...merge.added.map((key) => `added ${key}`),
    ...merge.changed.flatMap((c) => c.fields.map((f) => `${c.key}: ${labelOf(f.field)} ${show(f.from)} → ${show(f.to)}`)),
  ];
  const listed = lines.slice(0, MAX_LISTED);
  if (lines.length > MAX_LISTED) listed.push(`… and ${lines.length - MAX_LISTED} more`);
  if (merge.unchanged.length > 0) listed.push(`${merge.unchanged.length} row${merge.unchanged.length === 1 ? "" : "s"} in the file unchanged`);
  return listed;
}

/** "How the file was read" list (delimiter, decimal comma, mapped and ignored headers), or nothing. */
function notesList(id: string, notes: readonly string[]): HTMLElement[] {
  if (notes.length === 0) return [];
  const list = document.createElement("ul");
  list.id = `${id}-import-notes`;
  list.className = "import-notes";
  for (const note of notes) {
    const li = document.createElement("li");
    li.textContent = note;
    list.append(li);
  }
  const head = document.createElement("p");
  head.textContent = "How the file was read:";
  return [head, list];
}

/** The import status line and merge preview of a table editor; returns the function that imports a file's text. */
export function tableImport<R extends Record<string, unknown>>(options: ImportOptions<R>, status: HTMLElement): { importText(text: string, name: string, mode: "replace" | "merge"): void; preview: HTMLElement } {
  const preview = document.createElement("div");
  preview.id = `${options.id}-merge-preview`;
  preview.className = "merge-preview";
  preview.hidden = true;
  const labelOf = (field: string) => options.columns.find((c) => c.field === field)?.label ?? field;

  const say = (ok: boolean, text: string) => {
    status.className = ok ? "import-ok" : "import-problems";
    if (ok) status.removeAttribute("role");
    else status.setAttribute("role", "alert");
    status.textContent = text;
  };

  function showMerge(rows: R[], name: string, notes: readonly string[] = []): void {
    const merge = mergeRows(options.current(), rows, options.keyField);
    const heading = document.createElement("p");
    heading.textContent = `Merge ${name} into the current table as a partial update (rows not in the file are kept). Changes:`;
    const list = document.createElement("ul");
    list.id = `${options.id}-merge-changes`;
    for (const line of mergeLines(merge, labelOf)) {
      const li = document.createElement("li");
      li.textContent = line;
      list.append(li);
    }
    const nothing = merge.added.length === 0 && merge.changed.length === 0;
    const apply = button("Apply these changes", `${options.id}-merge-apply`, () => {
      options.apply(mergeRows(options.current(), rows, options.keyField).rows, importedSetName(name, today(), options.currentName?.() ?? null));
      preview.hidden = true;
      preview.replaceChildren();
      say(true, `Merged ${name}: ${merge.added.length} added, ${merge.changed.length} changed.`);
    });
    apply.disabled = nothing;
    const cancel = button("Cancel", `${options.id}-merge-cancel`, () => {
      preview.hidden = true;
      preview.replaceChildren();
      say(true, `${name} was not merged; nothing changed.`);
    });
    preview.replaceChildren(...notesList(options.id, notes), heading, list, apply, cancel);
    preview.hidden = false;
    say(true, nothing ? `${name} changes nothing in the current table.` : `Preview of ${name}: nothing is applied until you apply it.`);
  }

  function importText(text: string, name: string, mode: "replace" | "merge"): void {
    preview.hidden = true;
    preview.replaceChildren();
    let rows: R[];
    let notes: string[] = [];
    let partial = false;
    try {
      if (options.read) ({ rows, notes, partial } = options.read(text, name, options.current()));
      else rows = options.parseCsv(text, name);
    } catch (error) {
      if (error instanceof CsvError) say(false, `${name} was not imported; nothing changed. ${error.problems.length} problem${error.problems.length === 1 ? "" : "s"}:\n${listProblems(error.problems, MAX_LISTED).join("\n")}`);
      else say(false, `${name} was not imported; nothing changed: ${messageOf(error)}`);
      return;
    }
    // A file with only some columns can only update rows the table has: always previewed as a merge.
    if (mode === "merge" || partial) return showMerge(rows, name, notes);
    const gaps = options.missingFor?.(rows) ?? [];
    if (gaps.length > 0) {
      const names = gaps.slice(0, MAX_LISTED).map((g) => `${g.key} (needed by ${g.neededBy.join(", ")})`);
      if (gaps.length > MAX_LISTED) names.push(`… and ${gaps.length - MAX_LISTED} more`);
      say(false, `${name} was not imported; nothing changed. It lacks ${gaps.length} ${options.rowNoun}${gaps.length === 1 ? "" : "s"} the schemes need:\n${names.join("\n")}\nIf it is meant as a partial update, merge it into the current table instead:`);
      status.append(" ", button("Preview the merge…", `${options.id}-merge-offer`, () => showMerge(rows, name, notes)));
      return;
    }
    options.apply(rows, importedSetName(name, today()));
    say(true, `Imported ${rows.length} rows from ${name}.${notes.length > 0 ? ` ${notes.join("; ")}.` : ""}`);
  }

  return { importText, preview };
}
