import { studyFromJson, describeProblems, type Study } from "../study";

/**
 * The study file picker every page uses: a button that opens the browser's file dialog (the file
 * input itself hidden, named for assistive technology). A file that is not a valid study is
 * refused with the reason; `onStudy` gets a valid one with its file name.
 */
export function studyFilePicker(options: { label: string; inputLabel: string; id?: string; onStudy: (study: Study, name: string) => void; onRefused: (message: string) => void }): HTMLElement[] {
  const file = document.createElement("input");
  file.type = "file";
  file.accept = ".json,application/json";
  file.hidden = true;
  if (options.id) file.id = options.id;
  file.setAttribute("aria-label", options.inputLabel);
  file.addEventListener("change", async () => {
    const chosen = file.files?.[0];
    if (!chosen) return;
    const result = studyFromJson(await chosen.text());
    if (result.ok) options.onStudy(result.study, chosen.name);
    else options.onRefused(`${chosen.name} was not opened; nothing changed:\n${describeProblems(result.problems)}`);
    file.value = "";
  });
  const button = document.createElement("button");
  button.type = "button";
  button.textContent = options.label;
  button.addEventListener("click", () => file.click());
  return [button, file];
}
