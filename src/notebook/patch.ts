// Updating what is on the page in place (issue 14, "a slider that keeps up"): a cell that draws
// the same shape with new numbers (a list of key values, the brief's section) keeps its nodes and
// has only the texts and attributes that differ written. A new node makes Chrome style, lay out and
// paint it from nothing; a changed text is laid out and painted alone.

/** Whether two nodes can be patched into one another: same kind of node, same element. */
function sameKind(a: Node, b: Node): boolean {
  if (a.nodeType !== b.nodeType) return false;
  if (a instanceof Element && b instanceof Element) return a.namespaceURI === b.namespaceURI && a.localName === b.localName;
  return a.nodeType === Node.TEXT_NODE || a.nodeType === Node.COMMENT_NODE;
}

/** Gives `target` the attributes of `source`, writing only those that differ; whether any was. */
function patchAttributes(target: Element, source: Element): boolean {
  let wrote = false;
  for (const name of target.getAttributeNames()) {
    if (source.hasAttribute(name)) continue;
    target.removeAttribute(name);
    wrote = true;
  }
  for (const name of source.getAttributeNames()) {
    const value = source.getAttribute(name)!;
    if (target.getAttribute(name) === value) continue;
    target.setAttribute(name, value);
    wrote = true;
  }
  return wrote;
}

/**
 * Makes `parent`'s children equal to `fresh` (in content, attributes and text), keeping every
 * existing node whose kind matches the one at its place and writing only what differs; nodes
 * whose kind differs, and children beyond the old count, are taken from `fresh`. Returns the
 * number of nodes written (replaced or changed), for tests.
 *
 * Only for plain content: a kept node keeps its own event listeners and the new node's are
 * dropped, so patch only content whose listeners (if any) read the live page rather than what
 * they were made with.
 */
export function patchChildren(parent: Node, fresh: readonly Node[]): number {
  let written = 0;
  const old = [...parent.childNodes];
  fresh.forEach((node, k) => {
    const existing = old[k];
    if (existing === node) return;
    if (existing === undefined) {
      parent.appendChild(node);
      written += 1;
    } else if (!sameKind(existing, node)) {
      parent.replaceChild(node, existing);
      written += 1;
    } else written += patchNode(existing, node);
  });
  for (const extra of old.slice(fresh.length)) {
    parent.removeChild(extra);
    written += 1;
  }
  return written;
}

/** Makes `target` equal to `source` (same kind, see sameKind); returns the nodes written. */
function patchNode(target: Node, source: Node): number {
  if (target instanceof Element && source instanceof Element) {
    return Number(patchAttributes(target, source)) + patchChildren(target, [...source.childNodes]);
  }
  if (target.nodeValue === source.nodeValue) return 0;
  target.nodeValue = source.nodeValue;
  return 1;
}

/** Sets an element's text only when it differs (setting it replaces its text node, which is then laid out and painted again). */
export function setText(node: Element, text: string): void {
  if (node.textContent !== text) node.textContent = text;
}

/** Sets an attribute only when it differs (every write is a mutation the browser answers). */
export function setAttr(node: Element, name: string, value: string): void {
  if (node.getAttribute(name) !== value) node.setAttribute(name, value);
}

/** Adds or removes a class only when that changes it (classList.remove of an absent class still rewrites the attribute). */
export function setClass(node: Element, name: string, on: boolean): void {
  if (node.classList.contains(name) !== on) node.classList.toggle(name, on);
}
