import { effect, type ReadonlySignal } from "@preact/signals-core";

/**
 * A value a control shows and changes: read reactively, written through a callback. A binding
 * may `check` a value first (a study binding checks the candidate study against the schema): a
 * message means the control applies nothing and shows it.
 */
export interface Binding<T> {
  value: ReadonlySignal<T>;
  set(next: T): void;
  check?(next: T): string | null;
}

/** Applies `next` unless the binding's check refuses it; returns the refusal or null. */
function refused<T>(binding: Binding<T>, next: T): string | null {
  const problem = binding.check?.(next) ?? null;
  if (problem === null) binding.set(next);
  return problem;
}

/** An inline message element tied to an input for screen readers. */
function messageFor(input: HTMLElement, id: string): HTMLDivElement {
  const message = document.createElement("div");
  message.className = "control-message";
  message.id = `${id}-message`;
  message.setAttribute("aria-live", "polite");
  input.setAttribute("aria-describedby", message.id);
  return message;
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
 * allowed (the value is then not applied, and the one in force named: see editField), and
 * optionally a slider bound to the same value.
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
  const message = messageFor(input, id);
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
  const unitText = options.unit && options.unit !== "–" ? ` ${options.unit}` : "";
  const field = editField<number>(binding, { input, wrap, message, label: options.label }, {
    parse: (raw) => {
      const text = problem(raw);
      return text === null ? { value: Number(raw) + 0 } : { problem: text }; // + 0: "-0" is stored as 0
    },
    shows: (raw, value) => raw !== "" && Number(raw) === value,
    show: (value) => String(value),
    inForce: (value) => `${value}${unitText}`,
    slider,
  });
  slider?.addEventListener("input", () => {
    if (slider) field.applyOnce(slider.value);
  });
  return wrap;
}

interface FieldParts {
  input: HTMLInputElement;
  wrap: HTMLElement;
  message: HTMLElement;
  label: string;
}

interface FieldRules<T> {
  parse(raw: string): { value: T } | { problem: string };
  /** Whether the raw text already shows this value (then it is left alone while typing). */
  shows(raw: string, value: T): boolean;
  show(value: T): string;
  inForce(value: T): string;
  slider?: HTMLInputElement | undefined;
}

/**
 * Ties a typed field to a binding. Every keystroke is checked (the field's own rules, then the
 * binding's check of the candidate study) and a valid value applied at once; when the text is
 * not allowed, the value in force before this edit began is put back, so a valid prefix (typing
 * "1e308" passes through "1") is never left applied, and the message says which value is in force.
 * Enter or leaving the field replaces invalid text by that value; the message stays until the value changes.
 */
function editField<T>(binding: Binding<T>, parts: FieldParts, rules: FieldRules<T>): { applyOnce(raw: string): void } {
  const { input, wrap, message } = parts;
  let committed = binding.value.peek();
  let holding = false;
  const apply = (raw: string, fromField: boolean) => {
    const parsed = rules.parse(raw);
    let text = "problem" in parsed ? parsed.problem : null;
    if (!("problem" in parsed)) {
      const refusal = refused(binding, parsed.value);
      if (refusal !== null) text = `${parts.label}: ${refusal}`;
    }
    holding = text !== null && fromField;
    if (text !== null) {
      if (!Object.is(binding.value.peek(), committed)) binding.set(committed);
      text += ` — not applied; in force: ${rules.inForce(committed)}`;
    }
    input.setAttribute("aria-invalid", text ? "true" : "false");
    wrap.classList.toggle("invalid", text !== null);
    message.textContent = text ?? "";
  };
  input.addEventListener("focus", () => {
    committed = binding.value.peek();
  });
  input.addEventListener("input", () => apply(input.value, true));
  input.addEventListener("change", () => {
    if (!holding) committed = binding.value.peek();
    else {
      holding = false;
      input.value = rules.show(binding.value.peek());
    }
  });
  effect(() => {
    const value = binding.value.value;
    if (rules.slider) rules.slider.value = rules.show(value);
    if (holding) return;
    if (document.activeElement !== input) committed = value;
    if (!rules.shows(input.value, value)) input.value = rules.show(value);
    wrap.classList.remove("invalid");
    input.setAttribute("aria-invalid", "false");
    message.textContent = "";
  });
  return {
    /** One step of a slider: checked and applied like a keystroke, and put back at once if refused. */
    applyOnce(raw: string) {
      committed = binding.value.peek();
      apply(raw, false);
      input.value = rules.show(binding.value.peek());
      if (rules.slider) rules.slider.value = rules.show(binding.value.peek());
    },
  };
}

export interface TextControlOptions {
  label: string;
  id?: string;
  hint?: string;
  size?: number;
  /** The message for a value that is not allowed, or null when it is (then it is applied). */
  check: (raw: string) => string | null;
}

/** A text field checked on every keystroke: an inline message for a value not allowed, which is then not applied (see editField). */
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
  const message = messageFor(input, id);
  wrap.append(label, input, message);
  if (options.hint) {
    const hint = document.createElement("div");
    hint.className = "control-hint";
    hint.textContent = options.hint;
    wrap.append(hint);
  }
  editField<string>(binding, { input, wrap, message, label: options.label }, {
    parse: (raw) => {
      const problem = options.check(raw.trim());
      return problem === null ? { value: raw.trim() } : { problem: `${options.label}: ${problem}` };
    },
    shows: (raw, value) => raw.trim() === value,
    show: (value) => value,
    inForce: (value) => `"${value}"`,
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
  const message = messageFor(select, id);
  select.addEventListener("change", () => {
    const refusal = refused(binding, select.value);
    message.textContent = refusal === null ? "" : `${options.label}: ${refusal} — not applied`;
    if (refusal !== null) select.value = binding.value.peek();
  });
  effect(() => {
    select.value = binding.value.value;
  });
  wrap.append(label, select, message);
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
  const message = messageFor(input, id);
  input.addEventListener("change", () => {
    const refusal = refused(binding, input.checked);
    message.textContent = refusal === null ? "" : `${options.label}: ${refusal} — not applied`;
    if (refusal !== null) input.checked = binding.value.peek();
  });
  effect(() => {
    input.checked = binding.value.value;
  });
  wrap.append(input, label, message);
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
