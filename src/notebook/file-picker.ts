import { h, render, Fragment, type ComponentChild } from "preact";
import { useRef } from "preact/hooks";
import { studyFromJson, describeProblems, type Study } from "../study";

export type StudyFilePickerProps = { label: string; inputLabel: string; id?: string; onStudy: (study: Study, name: string) => void; onRefused: (message: string) => void };

/**
 * The study file picker every page uses: a button that opens the browser's file dialog (the file
 * input itself hidden, named for assistive technology). A file that is not a valid study is
 * refused with the reason; `onStudy` gets a valid one with its file name.
 */
export function StudyFilePicker(props: StudyFilePickerProps): ComponentChild {
  const input = useRef<HTMLInputElement>(null);
  const chosen = async (file: HTMLInputElement) => {
    const picked = file.files?.[0];
    if (!picked) return;
    const result = studyFromJson(await picked.text());
    if (result.ok) props.onStudy(result.study, picked.name);
    else props.onRefused(`${picked.name} was not opened; nothing changed:\n${describeProblems(result.problems)}`);
    file.value = "";
  };
  return h(Fragment, null, [
    h("button", { type: "button", onClick: () => input.current?.click() }, props.label),
    h("input", {
      ref: input,
      type: "file",
      accept: ".json,application/json",
      hidden: true,
      id: props.id,
      "aria-label": props.inputLabel,
      onChange: (event: Event) => void chosen(event.currentTarget as HTMLInputElement),
    }),
  ]);
}

/** The same picker for a page that builds its DOM by hand (the method page's study comparison): one element holding it. */
export function studyFilePicker(props: StudyFilePickerProps): HTMLElement {
  const host = document.createElement("span");
  host.className = "file-picker";
  render(h(StudyFilePicker, props), host);
  return host;
}
