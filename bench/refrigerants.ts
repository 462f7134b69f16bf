// Prints saturation lookups per second in both directions; a figure to read, never a pass/fail gate.
import {
  REFRIGERANT_IDS,
  refrigerantInfo,
  saturationPressure,
  saturationTemperature,
} from "@/lib/refrigerants";

const INPUTS = 4096;
const ROUNDS = 5;
const CALLS_PER_ROUND = 2_000_000;

function inputsFor(make: (fraction: number) => number): Float64Array {
  // A fixed pseudo-random spread over the whole range, so branch prediction cannot learn one cell.
  let seed = 12345;
  return Float64Array.from({ length: INPUTS }, () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return make(seed / 2147483648);
  });
}

function measure(run: (i: number) => number): { perSecond: number[]; sink: number } {
  let sink = 0;
  for (let i = 0; i < 200_000; i++) sink += run(i & (INPUTS - 1)); // warm-up for the JIT
  const perSecond: number[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    const start = process.hrtime.bigint();
    for (let i = 0; i < CALLS_PER_ROUND; i++) sink += run(i & (INPUTS - 1));
    const seconds = Number(process.hrtime.bigint() - start) / 1e9;
    perSecond.push(CALLS_PER_ROUND / seconds);
  }
  return { perSecond: perSecond.sort((a, b) => a - b), sink };
}

const million = (n: number) => `${(n / 1e6).toFixed(2)} M/s`;
let checksum = 0;
console.log(
  `saturation lookups, ${ROUNDS} rounds of ${CALLS_PER_ROUND.toLocaleString("en")} calls (node ${process.version})`,
);
console.log("refrigerant  direction              median       slowest      fastest");
for (const id of REFRIGERANT_IDS) {
  const { minTempC, maxTempC } = refrigerantInfo(id);
  const temps = inputsFor((f) => minTempC + f * (maxTempC - minTempC));
  const pressures = temps.map((t) => saturationPressure(id, t));
  const forward = measure((i) => saturationPressure(id, temps[i]!));
  const inverse = measure((i) => saturationTemperature(id, pressures[i]!));
  checksum += forward.sink + inverse.sink;
  for (const [label, result] of [
    ["T → p (pressure)", forward],
    ["p → T (temperature)", inverse],
  ] as const) {
    const median = result.perSecond[Math.floor(ROUNDS / 2)]!;
    console.log(
      `${id.padEnd(12)} ${label.padEnd(22)} ${million(median).padEnd(12)} ${million(result.perSecond[0]!).padEnd(12)} ${million(result.perSecond.at(-1)!)}`,
    );
  }
}
console.log(`goal: at least 2 M/s each direction (checksum ${checksum.toExponential(3)})`);
