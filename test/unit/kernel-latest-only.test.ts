import { describe, expect, it } from "vitest";
import { latestOnly } from "../../src/kernel/worker-call";

/** A call whose answers the test releases by hand, with the arguments of every call started. */
function heldCall() {
  const started: number[] = [];
  const release: (() => void)[] = [];
  const call = (x: number) => {
    started.push(x);
    return new Promise<number>((resolve) => release.push(() => resolve(x * 10)));
  };
  return { started, release, call };
}

const nextTask = () => new Promise((resolve) => setTimeout(resolve, 0));

describe("latestOnly", () => {
  it("starts an idle call in a task of its own, with the newest arguments asked for before it starts", async () => {
    const { started, release, call } = heldCall();
    const results: [number, number][] = [];
    const ask = latestOnly(call, (r, a) => results.push([r, a]), () => undefined);
    ask(1);
    ask(2);
    expect(started).toEqual([]); // nothing sent within the caller's task (a slider step)
    await nextTask();
    expect(started).toEqual([2]);
    release[0]!();
    await nextTask();
    expect(results).toEqual([[20, 2]]);
  });

  it("keeps one call waiting while one runs, and drops the answer to arguments that were replaced", async () => {
    const { started, release, call } = heldCall();
    const results: [number, number][] = [];
    const ask = latestOnly(call, (r, a) => results.push([r, a]), () => undefined);
    ask(1);
    await nextTask();
    ask(2);
    ask(3); // replaces 2 while 1 runs
    release[0]!();
    await nextTask();
    expect(results).toEqual([]); // 1's answer is stale: 3 waited
    expect(started).toEqual([1, 3]);
    release[1]!();
    await nextTask();
    expect(results).toEqual([[30, 3]]);
    ask(4); // idle again: starts afresh, in its own task
    expect(started).toEqual([1, 3]);
    await nextTask();
    expect(started).toEqual([1, 3, 4]);
  });

  it("gives a failure of the newest call to onError, and a later call still runs", async () => {
    const errors: string[] = [];
    const results: number[] = [];
    let fail = true;
    const ask = latestOnly(
      (x: number) => (fail ? Promise.reject(new Error(`no ${x}`)) : Promise.resolve(x)),
      (r) => results.push(r),
      (e) => errors.push((e as Error).message),
    );
    ask(7);
    await nextTask();
    await nextTask();
    expect(errors).toEqual(["no 7"]);
    fail = false;
    ask(8);
    await nextTask();
    await nextTask();
    expect(results).toEqual([8]);
  });
});
