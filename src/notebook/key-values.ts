/** A definition list of label → value text. */
export function keyValues(items: readonly (readonly [string, string])[]): HTMLElement {
  const dl = document.createElement("dl");
  dl.className = "kv";
  for (const [key, value] of items) {
    const dt = document.createElement("dt");
    dt.textContent = key;
    const dd = document.createElement("dd");
    dd.textContent = value;
    dl.append(dt, dd);
  }
  return dl;
}
