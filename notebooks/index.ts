// Home: what spanbook is, and the pages with who each is for.
import "../src/notebook/style.css";
import { PAGES, CAUTION } from "../src/notebook/pages";
import { SCHEME_DECLARATIONS } from "../src/schemes/declarations";

const main = document.createElement("main");
main.className = "notebook";
// the schemes named from their declarations, so a new one is listed here too (the timber dome was missing)
const names = SCHEME_DECLARATIONS.map((d) => d.label.toLowerCase());
main.innerHTML = `<h1>spanbook</h1>
<p class="intro">Feasibility-stage comparison of long-span roof schemes — ${names.slice(0, -1).join(", ")} and ${names.at(-1)} — on weight, embodied carbon and cost per m² of usable floor.</p>`;
const caution = document.createElement("p");
caution.className = "caution";
caution.textContent = CAUTION;
const list = document.createElement("ul");
for (const page of PAGES) {
  const li = document.createElement("li");
  const a = document.createElement("a");
  a.href = `./${page.file}`;
  a.textContent = page.title;
  li.append(a, ` — for ${page.who === "everyone" ? "everyone" : `the ${page.who}`}`);
  list.append(li);
}
main.append(caution, list);
document.body.replaceChildren(main);
