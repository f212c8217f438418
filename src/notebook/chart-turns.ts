// Several charts drawn after one change, one per animation frame (issues 13/14: no main-thread
// task over 50 ms): each chart has its own slot in a grid, and the previous drawing stays in its
// slot until its successor is ready.
import { errorBox } from "./cell";
import { inTurns } from "./settle";

export interface ChartTurns {
  /** The grid of slots: a cell returns it from every render (the same element, kept). */
  grid: HTMLElement;
  /**
   * Draws `charts` into the slots in order, one per frame; a newer call drops the charts the older
   * one has not drawn yet. A chart that throws shows its error in its slot. When all are drawn,
   * `data-drawn` on `counter()` (the cell) goes up by one, so tests and benches see a finished set.
   */
  draw(charts: readonly (() => HTMLElement)[], counter: () => HTMLElement): void;
  /** Resolves once no set is being drawn (at once when none is): the span study holds its heavy pass until then. */
  idle(): Promise<void>;
}

export function chartTurns(count: number): ChartTurns {
  const turns = { generation: 0 };
  const grid = document.createElement("div");
  grid.className = "grid charts";
  const slots = Array.from({ length: count }, () => grid.appendChild(document.createElement("div")));
  let drawing = false;
  let waiting: (() => void)[] = [];
  return {
    grid,
    idle() {
      return drawing ? new Promise((resolve) => waiting.push(resolve)) : Promise.resolve();
    },
    draw(charts, counter) {
      drawing = true;
      const jobs = charts.map((chart, k) => () => {
        let figure: HTMLElement;
        try {
          figure = chart();
        } catch (error) {
          figure = errorBox(error);
        }
        slots[k]?.replaceChildren(figure);
      });
      // a newer set drops this one's remaining jobs, and only the newest set's end is waited for
      inTurns(turns, jobs, () => {
        const cell = counter();
        cell.dataset.drawn = String(Number(cell.dataset.drawn ?? 0) + 1);
        drawing = false;
        const resolve = waiting;
        waiting = [];
        resolve.forEach((r) => r());
      });
    },
  };
}
