import { effect, type ReadonlySignal } from "@preact/signals-core";

/** A value a control shows and changes: read reactively, written through a callback. */
export interface Binding<T> {
  value: ReadonlySignal<T>;
  set(next: T): void;
}

let counter = 0;
function uid(prefix: string): string {
  counter += 1;
  return `${prefix}-${counter}`;
}

export interface NumberControlOptions {
  label: string;
  unit: string;
  min: number;
  max: number;
  step: number;
  /** Whole numbers only. */
  integer?: boolean;
  /** Also show a slider bound to the same value. */
  slider?: boolean;
  /** Extra help shown under the label. */
  hint?: string;
  id?: string;
}

/**
 * A number field with its unit, min/max/step, an inline message when the typed value is not
 * allowed (the value is then not applied), and optionally a slider bound to the same value.
 */
export function numberControl(binding: Binding<number>, options: NumberControlOptions): HTMLElement {
  const id = options.id ?? uid("num");
  const wrap = document.createElement("div");
  wrap.className = "control control-number";
  const label = document.createElement("label");
  label.htmlFor = id;
  label.textContent = options.label;
  const unit = document.createElement("span");
  unit.className = "unit";
  unit.textContent = options.unit;
  const input = document.createElement("input");
  input.type = "number";
  input.id = id;
  input.min = String(options.min);
  input.max = String(options.max);
  input.step = String(options.step);
  input.inputMode = "decimal";
  const message = document.createElement("div");
  message.className = "control-message";
  message.id = `${id}-message`;
  message.setAttribute("aria-live", "polite");
  input.setAttribute("aria-describedby", message.id);
  const row = document.createElement("div");
  row.className = "control-row";
  row.append(input, unit);
  let slider: HTMLInputElement | undefined;
  if (options.slider) {
    slider = document.createElement("input");
    slider.type = "range";
    slider.min = String(options.min);
    slider.max = String(options.max);
    slider.step = String(options.step);
    slider.setAttribute("aria-label", `${options.label} (slider)`);
    row.append(slider);
  }
  wrap.append(label, row, message);
  if (options.hint) {
    const hint = document.createElement("div");
    hint.className = "control-hint";
    hint.textContent = options.hint;
    wrap.append(hint);
  }

  const problem = (raw: string): string | null => {
    if (raw.trim() === "") return `${options.label}: a value is required`;
    const x = Number(raw);
    if (!Number.isFinite(x)) return `${options.label}: "${raw}" is not a number`;
    if (x < options.min || x > options.max) return `${options.label}: ${x} ${options.unit} is out of range (allowed ${options.min} to ${options.max} ${options.unit})`;
    if (options.integer && !Number.isInteger(x)) return `${options.label}: ${x} is not a whole number`;
    return null;
  };
  const apply = (raw: string) => {
    const text = problem(raw);
    message.textContent = text ?? "";
    input.setAttribute("aria-invalid", text ? "true" : "false");
    wrap.classList.toggle("invalid", text !== null);
    if (text === null) binding.set(Number(raw));
  };
  input.addEventListener("input", () => apply(input.value));
  slider?.addEventListener("input", () => {
    if (slider) {
      input.value = slider.value;
      apply(slider.value);
    }
  });
  effect(() => {
    const value = binding.value.value;
    if (!wrap.classList.contains("invalid") || document.activeElement !== input) {
      if (Number(input.value) !== value || input.value === "") input.value = String(value);
      wrap.classList.remove("invalid");
      message.textContent = "";
    }
    if (slider) slider.value = String(value);
  });
  return wrap;
}

export interface TextControlOptions {
  label: string;
  id?: string;
  hint?: string;
  size?: number;
  /** The message for a value that is not allowed, or null when it is (then it is applied). */
  check: (raw: string) => string | null;
}

/** A text field checked on every keystroke: an inline message for a value not allowed, which is then not applied. */
export function textControl(binding: Binding<string>, options: TextControlOptions): HTMLElement {
  const id = options.id ?? uid("txt");
  const wrap = document.createElement("div");
  wrap.className = "control control-text";
  const label = document.createElement("label");
  label.htmlFor = id;
  label.textContent = options.label;
  const input = document.createElement("input");
  input.type = "text";
  input.id = id;
  input.size = options.size ?? 8;
  const message = document.createElement("div");
  message.className = "control-message";
  message.id = `${id}-message`;
  message.setAttribute("aria-live", "polite");
  input.setAttribute("aria-describedby", message.id);
  wrap.append(label, input, message);
  if (options.hint) {
    const hint = document.createElement("div");
    hint.className = "control-hint";
    hint.textContent = options.hint;
    wrap.append(hint);
  }
  input.addEventListener("input", () => {
    const raw = input.value.trim();
    const problem = options.check(raw);
    message.textContent = problem === null ? "" : `${options.label}: ${problem}`;
    input.setAttribute("aria-invalid", problem === null ? "false" : "true");
    wrap.classList.toggle("invalid", problem !== null);
    if (problem === null) binding.set(raw);
  });
  effect(() => {
    const value = binding.value.value;
    if (wrap.classList.contains("invalid") && document.activeElement === input) return;
    input.value = value;
    wrap.classList.remove("invalid");
    message.textContent = "";
  });
  return wrap;
}

export interface SelectControlOptions {
  label: string;
  choices: readonly { value: string; label: string }[];
  id?: string;
}

/** A drop-down list. */
export function selectControl(binding: Binding<string>, options: SelectControlOptions): HTMLElement {
  const id = options.id ?? uid("sel");
  const wrap = document.createElement("div");
  wrap.className = "control control-select";
  const label = document.createElement("label");
  label.htmlFor = id;
  label.textContent = options.label;
  const select = document.createElement("select");
  select.id = id;
  for (const choice of options.choices) {
    const option = document.createElement("option");
    option.value = choice.value;
    option.textContent = choice.label;
    select.append(option);
  }
  select.addEventListener("change", () => binding.set(select.value));
  effect(() => {
    select.value = binding.value.value;
  });
  wrap.append(label, select);
  return wrap;
}

/** A checkbox toggle. */
export function toggleControl(binding: Binding<boolean>, options: { label: string; id?: string }): HTMLElement {
  const id = options.id ?? uid("tog");
  const wrap = document.createElement("div");
  wrap.className = "control control-toggle";
  const input = document.createElement("input");
  input.type = "checkbox";
  input.id = id;
  const label = document.createElement("label");
  label.htmlFor = id;
  label.textContent = options.label;
  input.addEventListener("change", () => binding.set(input.checked));
  effect(() => {
    input.checked = binding.value.value;
  });
  wrap.append(input, label);
  return wrap;
}

/** A labelled group of controls. */
export function controlGroup(title: string, controls: readonly HTMLElement[]): HTMLElement {
  const fieldset = document.createElement("fieldset");
  fieldset.className = "control-group";
  const legend = document.createElement("legend");
  legend.textContent = title;
  fieldset.append(legend, ...controls);
  return fieldset;
}
