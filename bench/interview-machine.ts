// The interview machine's share of "answer typed → values on screen": `npx tsx bench/interview-machine.ts`.
// Prints figures only; the goal (well under one 16 ms frame) is not asserted.
import { cpus, loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import { createActor } from "xstate";
import { diagnose } from "@/lib/diagnosis";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { interviewMachine } from "@/machines/interview";
import { viewOf } from "@/machines/interview-view";

function percentile(sortedMs: number[], p: number): number {
  return sortedMs[Math.min(sortedMs.length - 1, Math.floor((p / 100) * sortedMs.length))] ?? NaN;
}

function measure(label: string, runs: number, once: (i: number) => void): void {
  for (let i = 0; i < 200; i += 1) once(i); // warm-up
  const timesMs: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const start = performance.now();
    once(i);
    timesMs.push(performance.now() - start);
  }
  timesMs.sort((a, b) => a - b);
  const meanMs = timesMs.reduce((sum, t) => sum + t, 0) / runs;
  const fmt = (ms: number) => `${ms.toFixed(3)} ms`;
  console.log(
    `${label.padEnd(44)} ${String(Math.round(1000 / meanMs)).padStart(7)} /s  p50 ${fmt(percentile(timesMs, 50))}  p95 ${fmt(percentile(timesMs, 95))}  p99 ${fmt(percentile(timesMs, 99))}`,
  );
}

console.log(
  `load average ${loadavg()
    .map((l) => l.toFixed(1))
    .join(" ")} on ${cpus().length} CPUs (busy machines widen p99)`,
);

const actor = createActor(interviewMachine, {
  input: { answers: exampleAnswers, step: "running", shop: { altitudeM: 250 } },
}).start();
const highs = Array.from({ length: 64 }, (_, i) => 1200 + i * 15);
const answerRunning = (i: number) =>
  actor.send({
    type: "ANSWER",
    group: "running",
    values: { ...exampleAnswers.running, highKpaGauge: highs[i % highs.length] },
  });

measure("ANSWER (validate, store, re-route)", 5000, answerRunning);
measure("ANSWER + viewOf (progress, cautions, input)", 5000, (i) => {
  answerRunning(i);
  viewOf(actor.getSnapshot());
});
measure("ANSWER + viewOf + diagnose", 5000, (i) => {
  answerRunning(i);
  const input = viewOf(actor.getSnapshot()).diagnosisInput;
  if (input) diagnose(input);
});
measure("static ANSWER (runs the saturation check)", 5000, (i) =>
  actor.send({ type: "ANSWER", group: "static", values: { staticKpaGauge: 600 + (i % 50) } }),
);
measure("resume: createActor + start from saved", 2000, () => {
  createActor(interviewMachine, { input: { answers: exampleAnswers, step: "findings" } })
    .start()
    .stop();
});
