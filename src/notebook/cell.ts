import { effect } from "@preact/signals-core";
import { unmountWithin } from "./controls";
import { patchChildren, setClass } from "./patch";
import { messageOf } from "../kernel/errors";

/** What a cell's render function may return. */
export type CellContent = Node | string | null | undefined;

export interface CellOptions {
  /** Stable id, used for the element id and by tests. */
  id: string;
  /** Heading shown above the cell. */
  title?: string;
  /** Extra CSS class. */
  className?: string;
  /**
   * Update the content in place (see patchChildren): nodes of the same kind are kept and only the
   * texts and attributes that differ are written, so a redraw with new numbers is not styled, laid
   * out and painted from nothing. Only for plain content (kept nodes keep their own listeners).
   */
  patch?: boolean;
}

export interface Cell {
  element: HTMLElement;
  /** Stops the cell's reactive effect. */
  dispose(): void;
}

/**
 * A reactive cell: `render` reads signals; when any signal it read changes, the cell re-renders
 * (and only then). A render that throws shows the error in place of the content; the rest of the
 * page is unaffected. `data-renders` counts renders so tests can see which cells ran.
 */
export function reactiveCell(parent: HTMLElement, options: CellOptions, render: () => CellContent): Cell {
  const element = document.createElement("section");
  element.className = `cell${options.className ? ` ${options.className}` : ""}`;
  element.id = `cell-${options.id}`;
  element.dataset.renders = "0";
  if (options.title) {
    const heading = document.createElement("h2");
    heading.textContent = options.title;
    element.append(heading);
  }
  const body = document.createElement("div");
  body.className = "cell-body";
  element.append(body);
  parent.append(element);

  const dispose = effect(() => {
    const started = performance.now();
    let content: CellContent;
    let failed = false;
    try {
      content = render();
    } catch (error) {
      failed = true;
      content = errorBox(error);
    }
    const wasFailed = element.classList.contains("cell-failed");
    // written only when it changes: a rewritten class is a style invalidation on every render
    setClass(element, "cell-failed", failed);
    const nodes = content === null || content === undefined ? [] : [typeof content === "string" ? textNode(content) : content];
    showContent(body, nodes, options.patch === true && !failed && !wasFailed);
    element.dataset.renders = String(Number(element.dataset.renders) + 1);
    element.dataset.ms = (performance.now() - started).toFixed(1);
  });
  return { element, dispose };
}

/**
 * Puts `nodes` in `body`: nothing is written when they are already its children (a cell that returns
 * the element it shows, such as a grid of charts drawn in turns), they are patched in when `patch`,
 * otherwise they replace the last content, whose components end their effects before they leave.
 */
function showContent(body: HTMLElement, nodes: readonly Node[], patch: boolean): void {
  const children = body.childNodes;
  if (children.length === nodes.length && nodes.every((node, k) => children[k] === node)) return;
  if (patch) {
    patchChildren(body, nodes);
    return;
  }
  unmountWithin(body);
  body.replaceChildren(...nodes);
}

function textNode(text: string): Node {
  const p = document.createElement("p");
  p.textContent = text;
  return p;
}

/** The error box shown in a failed cell. */
export function errorBox(error: unknown): HTMLElement {
  const box = document.createElement("div");
  box.className = "cell-error";
  box.setAttribute("role", "alert");
  box.textContent = `This part of the page stopped: ${messageOf(error)}`;
  return box;
}

/** A cell whose content is built once (controls, prose): it reads no signals and never re-renders. */
export function staticCell(parent: HTMLElement, options: CellOptions, content: Node | string): HTMLElement {
  const element = document.createElement("section");
  element.className = `cell${options.className ? ` ${options.className}` : ""}`;
  element.id = `cell-${options.id}`;
  if (options.title) {
    const heading = document.createElement("h2");
    heading.textContent = options.title;
    element.append(heading);
  }
  element.append(typeof content === "string" ? textNode(content) : content);
  parent.append(element);
  return element;
}
