// Home: what spanbook is, and the pages with who each is for.
import "../src/notebook/style.css";
import { PAGES, CAUTION } from "../src/notebook/pages";

const main = document.createElement("main");
main.className = "notebook";
main.innerHTML = `<h1>spanbook</h1>
<p class="intro">Feasibility-stage comparison of long-span roof schemes — cable dome, mast-supported cable net, geodesic steel dome, long-span steel trusses and thin concrete shell — on weight, embodied carbon and cost per m² of usable floor.</p>`;
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
