// The study's controls as preact components (issue 11 item 5): each renders its markup once and,
// while mounted, ties its field to a binding (editField); unmounting disposes that tie, so a
// control taken off the page leaves no effect behind. The functions `numberControl` … return one
// mounted element for pages that lay out their cells by hand.
import { effect, type ReadonlySignal } from "@preact/signals-core";
import { h, render, type ComponentChild, type ComponentChildren, type VNode } from "preact";
import { useLayoutEffect, useRef } from "preact/hooks";
import { setAttr, setClass, setText } from "./patch";
import { numberHint } from "../kernel/csv-table";

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

let counter = 0;
/** The control's id: the given one, or a fresh one kept for the component's lifetime. */
function useControlId(prefix: string, given: string | undefined): string {
  const id = useRef<string | undefined>(undefined);
  if (id.current === undefined) {
    counter += 1;
    id.current = given ?? `${prefix}-${counter}`;
  }
  return id.current;
}

/** Runs `attach` once the component's elements exist and undoes it on unmount (layout effect: synchronous with render). */
function useAttached(attach: () => () => void, deps: readonly unknown[]): void {
  useLayoutEffect(attach, deps);
}

/** The inline message tied to its input for screen readers. */
function Message({ id }: { id: string }): ComponentChild {
  return h("div", { className: "control-message", id: `${id}-message`, "aria-live": "polite" });
}

function Hint({ text }: { text: string | undefined }): ComponentChild {
  return text ? h("div", { className: "control-hint" }, text) : null;
}

/** The elements of a control found from its wrapper once rendered. */
function parts<E extends HTMLElement = HTMLInputElement>(wrap: HTMLElement, id: string): { input: E; message: HTMLElement } {
  const input = wrap.querySelector<E>(`#${CSS.escape(id)}`);
  const message = wrap.querySelector<HTMLElement>(`#${CSS.escape(`${id}-message`)}`);
  if (!input || !message) throw new Error(`control ${id}: its input or message is missing`);
  return { input, message };
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

/** For text such as "12,5", "7,850" or "5 %": that it is not a number and what to write instead (numberHint); else null. */
export function writtenNumberProblem(raw: string): string | null {
  const hint = numberHint(raw);
  return hint === "" ? null : `"${raw}" is not a number${hint}`;
}

/** Why a typed number is not allowed, or null. */
export function numberProblem(raw: string, o: NumberControlOptions): string | null {
  if (raw.trim() === "") return `${o.label}: a value is required`;
  const x = Number(raw);
  const written = writtenNumberProblem(raw);
  if (written !== null) return `${o.label}: ${written}`;
  const unit = o.unit && o.unit !== "–" ? ` ${o.unit}` : "";
  if (!Number.isFinite(x)) return `${o.label}: "${raw}" is not a number (allowed ${o.min} to ${o.max}${unit})`;
  // a sign typed by habit (a suction coefficient written −0.8): say that the size alone is allowed
  const unsigned = x < 0 && -x >= o.min && -x <= o.max ? `; without the minus sign, ${-x}${unit} is allowed` : "";
  if (x < o.min || x > o.max) return `${o.label}: ${x}${unit} is out of range (allowed ${o.min} to ${o.max}${unit}${unsigned})`;
  if (o.integer && !Number.isInteger(x)) return `${o.label}: ${x} is not a whole number`;
  return null;
}

/**
 * The text of a number field's value one step up (+1) or down (−1) on its step grid from min, on
 * the step's own decimals and kept within min and max; null when the field holds no number (the arrow key then does nothing).
 */
export function steppedValue(raw: string, direction: 1 | -1, o: Pick<NumberControlOptions, "min" | "max" | "step">): string | null {
  const x = Number(raw);
  if (raw.trim() === "" || !Number.isFinite(x)) return null;
  // onto the step grid from min, as a number field does: 12.5 with step 1 from 0 goes up to 13
  const steps = (x - o.min) / o.step;
  const n = direction > 0 ? Math.floor(steps + 1e-9) + 1 : Math.ceil(steps - 1e-9) - 1;
  const decimals = Math.max(...[o.step, o.min].map((v) => (String(v).split(".")[1] ?? "").length));
  return (Math.min(o.max, Math.max(o.min, o.min + n * o.step)) + 0).toFixed(decimals); // + 0: no "-0"
}

/**
 * A number field with its unit, min/max/step, an inline message when the typed value is not
 * allowed (the value is then not applied, and the one in force named: see editField), and
 * optionally a slider bound to the same value.
 */
export function NumberControl(props: NumberControlOptions & { binding: Binding<number> }): ComponentChild {
  const { binding, ...o } = props;
  const id = useControlId("num", o.id);
  const wrap = useRef<HTMLDivElement>(null);
  useAttached(() => {
    const host = wrap.current;
    if (!host) return () => undefined;
    const { input, message } = parts(host, id);
    const slider = host.querySelector<HTMLInputElement>('input[type="range"]') ?? undefined;
    const unitText = o.unit && o.unit !== "–" ? ` ${o.unit}` : "";
    const field = editField<number>(binding, { input, wrap: host, message, label: o.label }, {
      parse: (raw) => {
        const text = numberProblem(raw, o);
        return text === null ? { value: Number(raw) + 0 } : { problem: text }; // + 0: "-0" is stored as 0
      },
      shows: (raw, value) => raw !== "" && Number(raw) === value,
      show: (value) => String(value),
      inForce: (value) => `${value}${unitText}`,
      slider,
    });
    const step = () => slider && field.applyOnce(slider.value);
    slider?.addEventListener("input", step);
    // the arrow keys step the value as a number field's do (the field is a text field: see below)
    const arrows = (event: KeyboardEvent) => {
      if (event.key !== "ArrowUp" && event.key !== "ArrowDown") return;
      const next = steppedValue(input.value, event.key === "ArrowUp" ? 1 : -1, o);
      if (next === null) return;
      event.preventDefault();
      input.value = next;
      field.applyOnce(next);
    };
    input.addEventListener("keydown", arrows);
    return () => {
      slider?.removeEventListener("input", step);
      input.removeEventListener("keydown", arrows);
      field.dispose();
    };
  }, [binding]);
  const range = { min: String(o.min), max: String(o.max), step: String(o.step) };
  return h("div", { className: "control control-number", ref: wrap }, [
    h("label", { htmlFor: id }, o.label),
    h("div", { className: "control-row" }, [
      // text, not number: Chromium reads a typed "12,5" as 125 and drops a stray letter, so the
      // field's own check never saw what was typed (audit8); inputMode still brings the number pad
      h("input", { type: "text", id, inputMode: "decimal", autocomplete: "off", spellcheck: false, "aria-describedby": `${id}-message` }),
      h("span", { className: "unit" }, o.unit),
      o.slider ? h("input", { type: "range", ...range, "aria-label": `${o.label} (slider)` }) : null,
    ]),
    h(Message, { id }),
    h(Hint, { text: o.hint }),
  ]);
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
 * `dispose` removes the listeners and the effect.
 */
function editField<T>(binding: Binding<T>, parts: FieldParts, rules: FieldRules<T>): { applyOnce(raw: string): void; dispose(): void } {
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
    // written only when they change: a slider step runs this for every step (issue 14)
    setAttr(input, "aria-invalid", text ? "true" : "false");
    setClass(wrap, "invalid", text !== null);
    setText(message, text ?? "");
  };
  const onFocus = () => {
    committed = binding.value.peek();
  };
  const onInput = () => apply(input.value, true);
  const onChange = () => {
    if (!holding) committed = binding.value.peek();
    else {
      holding = false;
      input.value = rules.show(binding.value.peek());
    }
  };
  input.addEventListener("focus", onFocus);
  input.addEventListener("input", onInput);
  input.addEventListener("change", onChange);
  const stop = effect(() => {
    const value = binding.value.value;
    if (rules.slider) rules.slider.value = rules.show(value);
    if (holding) return;
    if (document.activeElement !== input) committed = value;
    if (!rules.shows(input.value, value)) input.value = rules.show(value);
    setClass(wrap, "invalid", false);
    setAttr(input, "aria-invalid", "false");
    setText(message, "");
  });
  return {
    /** One step of a slider: checked and applied like a keystroke, and put back at once if refused. */
    applyOnce(raw: string) {
      committed = binding.value.peek();
      apply(raw, false);
      input.value = rules.show(binding.value.peek());
      if (rules.slider) rules.slider.value = rules.show(binding.value.peek());
    },
    dispose() {
      stop();
      input.removeEventListener("focus", onFocus);
      input.removeEventListener("input", onInput);
      input.removeEventListener("change", onChange);
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
export function TextControl(props: TextControlOptions & { binding: Binding<string> }): ComponentChild {
  const { binding, ...o } = props;
  const id = useControlId("txt", o.id);
  const wrap = useRef<HTMLDivElement>(null);
  useAttached(() => {
    const host = wrap.current;
    if (!host) return () => undefined;
    const { input, message } = parts(host, id);
    const field = editField<string>(binding, { input, wrap: host, message, label: o.label }, {
      parse: (raw) => {
        const problem = o.check(raw.trim());
        return problem === null ? { value: raw.trim() } : { problem: `${o.label}: ${problem}` };
      },
      shows: (raw, value) => raw.trim() === value,
      show: (value) => value,
      inForce: (value) => `"${value}"`,
    });
    return field.dispose;
  }, [binding]);
  return h("div", { className: "control control-text", ref: wrap }, [
    h("label", { htmlFor: id }, o.label),
    h("input", { type: "text", id, size: o.size ?? 8, "aria-describedby": `${id}-message` }),
    h(Message, { id }),
    h(Hint, { text: o.hint }),
  ]);
}

/**
 * Ties a select or checkbox to a binding: a change the binding refuses is put back and named;
 * the element follows the binding's value while mounted.
 */
function useChoice<T, E extends HTMLInputElement | HTMLSelectElement>(binding: Binding<T>, wrap: { current: HTMLElement | null }, id: string, label: string, read: (el: E) => T, write: (el: E, value: T) => void): void {
  useAttached(() => {
    const host = wrap.current;
    if (!host) return () => undefined;
    const { input, message } = parts<E>(host, id);
    const onChange = () => {
      const refusal = refused(binding, read(input));
      message.textContent = refusal === null ? "" : `${label}: ${refusal} — not applied`;
      if (refusal !== null) write(input, binding.value.peek());
    };
    input.addEventListener("change", onChange);
    const stop = effect(() => write(input, binding.value.value));
    return () => {
      stop();
      input.removeEventListener("change", onChange);
    };
  }, [binding]);
}

export interface SelectControlOptions {
  label: string;
  choices: readonly { value: string; label: string }[];
  id?: string;
}

/** A drop-down list. */
export function SelectControl(props: SelectControlOptions & { binding: Binding<string> }): ComponentChild {
  const { binding, label, choices } = props;
  const id = useControlId("sel", props.id);
  const wrap = useRef<HTMLDivElement>(null);
  useChoice<string, HTMLSelectElement>(binding, wrap, id, label, (el) => el.value, (el, value) => (el.value = value));
  return h("div", { className: "control control-select", ref: wrap }, [
    h("label", { htmlFor: id }, label),
    h("select", { id, "aria-describedby": `${id}-message` }, choices.map((c) => h("option", { key: c.value, value: c.value }, c.label))),
    h(Message, { id }),
  ]);
}

/** A checkbox toggle; `className` adds to the control's own (the "pinned" box is one). */
export function ToggleControl(props: { binding: Binding<boolean>; label: string; id?: string; className?: string }): ComponentChild {
  const { binding, label } = props;
  const id = useControlId("tog", props.id);
  const wrap = useRef<HTMLDivElement>(null);
  useChoice<boolean, HTMLInputElement>(binding, wrap, id, label, (el) => el.checked, (el, value) => (el.checked = value));
  return h("div", { className: `control control-toggle${props.className ? ` ${props.className}` : ""}`, ref: wrap }, [
    h("input", { type: "checkbox", id, "aria-describedby": `${id}-message` }),
    h("label", { htmlFor: id }, label),
    h(Message, { id }),
  ]);
}

/** A labelled group of controls. */
export function ControlGroup({ title, children }: { title: string; children?: ComponentChildren }): ComponentChild {
  return h("fieldset", { className: "control-group" }, [h("legend", null, title), children]);
}

/**
 * Mounts a component tree on an element of its own (laid out as if absent: `display: contents`)
 * for pages that build their cells by hand; `unmountWithin` takes such trees off again.
 */
export function mount<P>(vnode: VNode<P>): HTMLElement {
  const host = document.createElement("div");
  host.className = "mounted";
  render(vnode, host);
  return host;
}

/** Unmounts every tree mounted within `root` (their effects and listeners end with them). */
export function unmountWithin(root: Element): void {
  root.querySelectorAll(".mounted").forEach((host) => render(null, host));
}

/** A number field (see NumberControl), mounted. */
export function numberControl(binding: Binding<number>, options: NumberControlOptions): HTMLElement {
  return mount(h(NumberControl, { binding, ...options }));
}

/** A text field (see TextControl), mounted. */
export function textControl(binding: Binding<string>, options: TextControlOptions): HTMLElement {
  return mount(h(TextControl, { binding, ...options }));
}

/** A drop-down list (see SelectControl), mounted. */
export function selectControl(binding: Binding<string>, options: SelectControlOptions): HTMLElement {
  return mount(h(SelectControl, { binding, ...options }));
}

/** A checkbox (see ToggleControl), mounted. */
export function toggleControl(binding: Binding<boolean>, options: { label: string; id?: string }): HTMLElement {
  return mount(h(ToggleControl, { binding, ...options }));
}

/** A labelled group of elements built by hand. */
export function controlGroup(title: string, controls: readonly HTMLElement[]): HTMLElement {
  const fieldset = document.createElement("fieldset");
  fieldset.className = "control-group";
  const legend = document.createElement("legend");
  legend.textContent = title;
  fieldset.append(legend, ...controls);
  return fieldset;
}
