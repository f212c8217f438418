// A compressed study link is inflated before any page opens its study: this module's top-level
// await holds back every module that imports it (the study store, so every page) until the
// fragment in the address is the plain one the store reads synchronously. A damaged compressed
// link is left as it is; the store then says the link is damaged and opens nothing from it.
import { inflateStudyLink } from "../study/link";

async function inflateAddress(): Promise<void> {
  if (typeof location === "undefined" || !location.hash.startsWith("#s=z")) return;
  try {
    const plain = await inflateStudyLink(location.hash.slice(3));
    history.replaceState(null, "", `${location.pathname}${location.search}#s=${plain}`);
  } catch {
    // left for the store to report as a damaged link
  }
}

await inflateAddress();
