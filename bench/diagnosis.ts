// Findings-engine throughput: `npx tsx bench/diagnosis.ts`. Prints figures only; the goal (≥20,000/s) is not asserted.
import { loadavg } from "node:os";
import { diagnose, type DiagnosisInput, SYMPTOM_IDS } from "@/lib/diagnosis";
import { WORKED_CASES } from "@/lib/diagnosis/fixtures";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { EXPANSION_DEVICE_IDS } from "@/lib/vehicles/expansion-devices";

// R-744 systems are the rarer ones in a shop: half as likely as each of the others in the mix.
const REFRIGERANT_MIX = SERVICE_REFRIGERANT_IDS.flatMap((id) => (id === "R-744" ? [id] : [id, id]));

/** Small deterministic generator (mulberry32) so every run measures the same inputs. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function variedInputs(count: number): DiagnosisInput[] {
  const random = mulberry32(20261202);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)] as T;
  const maybe = (value: number) => (random() < 0.7 ? value : undefined);
  const inputs: DiagnosisInput[] = WORKED_CASES.map((c) => c.input);
  while (inputs.length < count) {
    const refrigerant = pick(REFRIGERANT_MIX);
    const scale = refrigerant === "R-744" ? 7 : 1;
    const ambientC = 15 + random() * 27;
    inputs.push({
      refrigerant,
      expansionDevice: pick(EXPANSION_DEVICE_IDS),
      ambientC,
      relativeHumidityPct: maybe(20 + random() * 70),
      altitudeM: maybe(random() * 1800),
      staticKpaGauge: maybe(random() * 900 * scale),
      highKpaGauge: maybe((400 + random() * 2000) * scale),
      lowKpaGauge: maybe((-30 + random() * 450) * (refrigerant === "R-744" ? 10 : 1)),
      liquidLineC: maybe(ambientC + random() * 30),
      suctionLineC: maybe(-5 + random() * 25),
      ventC: maybe(2 + random() * 20),
      labelChargeG: 400 + Math.round(random() * 800),
      recoveredChargeG: maybe(Math.round(random() * 1200)),
      identifierPurityPct: maybe(random() < 0.1 ? 80 + random() * 18 : 98 + random() * 2),
      identifierAirPct: maybe(random() * 5),
      symptoms: SYMPTOM_IDS.filter(() => random() < 0.08),
    });
  }
  return inputs;
}

const inputs = variedInputs(2000);
let sink = 0;
for (let i = 0; i < 5000; i++) sink += diagnose(inputs[i % inputs.length] as DiagnosisInput).suspects.length; // warm-up

const rounds = 10;
const perRound = 20000;
const latenciesUs: number[] = [];
const roundRates: number[] = [];
const cpuStarted = process.cpuUsage();
const started = performance.now();
for (let r = 0; r < rounds; r++) {
  const roundStarted = performance.now();
  for (let i = 0; i < perRound; i++) {
    const input = inputs[(r * perRound + i) % inputs.length] as DiagnosisInput;
    if (i % 50 === 0) {
      const t0 = performance.now();
      sink += diagnose(input).suspects.length;
      latenciesUs.push((performance.now() - t0) * 1000);
    } else {
      sink += diagnose(input).suspects.length;
    }
  }
  roundRates.push(perRound / ((performance.now() - roundStarted) / 1000));
}
const elapsedS = (performance.now() - started) / 1000;
const cpu = process.cpuUsage(cpuStarted);
// On a shared, busy machine wall time includes waiting for a core; CPU time is the work itself.
const cpuS = (cpu.user + cpu.system) / 1e6;
latenciesUs.sort((a, b) => a - b);
const pct = (p: number) =>
  latenciesUs[Math.min(latenciesUs.length - 1, Math.floor((p / 100) * latenciesUs.length))] ?? Number.NaN;

console.log(
  `inputs: ${inputs.length} varied (${WORKED_CASES.length} worked cases + generated), ${rounds * perRound} diagnoses`,
);
roundRates.sort((a, b) => a - b);
const rate = (value: number) => Math.round(value).toLocaleString("en-US");
console.log(
  `diagnoses/second: ${rate((rounds * perRound) / elapsedS)} overall, ${rate(roundRates[Math.floor(rounds / 2)] ?? 0)} median round, ${rate(roundRates.at(-1) ?? 0)} best round`,
);
console.log(
  `diagnoses per CPU-second: ${rate((rounds * perRound) / cpuS)} (process CPU ${cpuS.toFixed(2)} s over ${elapsedS.toFixed(2)} s wall)`,
);
console.log(
  `latency µs (sampled 1 in 50): p50 ${pct(50).toFixed(1)}, p95 ${pct(95).toFixed(1)}, p99 ${pct(99).toFixed(1)}`,
);
console.log(`machine load average (1 min) during the run: ${loadavg()[0]?.toFixed(1)}; (checksum ${sink})`);
