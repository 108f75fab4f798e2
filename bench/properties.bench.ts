// Evaluations per second of the property hot paths, over a million varied,
// precomputed inputs. Each function runs several rounds after a warm-up; the
// median round is reported. Run: npm run bench:properties [-- --json] [-- --only h_pT_region2]
import {
  enthalpyRegion1,
  enthalpyRegion2,
  pressureB23,
  saturationPressureRegion4,
  saturationTemperatureRegion4,
  temperatureB23,
  temperaturePHRegion2,
} from '../src/properties/index.js';
import { seededRandom as random } from '../src/seededRandom.js';

const INPUTS = 1_000_000;
const ROUNDS = 9;

interface Inputs {
  first: Float64Array;
  second: Float64Array;
}

/** Compressed liquid: 273.15-623.15 K, from saturation up to 100 MPa. */
function region1Inputs(next: () => number): Inputs {
  const p = new Float64Array(INPUTS);
  const T = new Float64Array(INPUTS);
  for (let i = 0; i < INPUTS; i++) {
    T[i] = 273.15 + 350 * next();
    const lowest = saturationPressureRegion4(T[i]);
    p[i] = lowest + (100 - lowest) * next();
  }
  return { first: p, second: T };
}

/** Steam: 1 kPa to 100 MPa (log-uniform), from saturation or the B23 line to 1073.15 K. */
function region2Inputs(next: () => number): Inputs {
  const p = new Float64Array(INPUTS);
  const T = new Float64Array(INPUTS);
  const boundary = pressureB23(623.15);
  for (let i = 0; i < INPUTS; i++) {
    p[i] = Math.exp(Math.log(0.001) + (Math.log(100) - Math.log(0.001)) * next());
    const coldest = p[i] <= boundary ? saturationTemperatureRegion4(p[i]) : temperatureB23(p[i]);
    T[i] = coldest + (1073.15 - coldest) * next();
  }
  return { first: p, second: T };
}

/** One pass over all inputs, summing the results so none can be optimised away. */
type Pass = (first: Float64Array, second: Float64Array) => number;

interface Case {
  name: string;
  pass: Pass;
  inputs: Inputs;
}

let sink = 0;

interface Rates {
  /** Evaluations per second of this process's CPU time: less disturbed by other processes than wall-clock time. */
  cpu: number;
  /** Evaluations per second of wall-clock time. */
  wall: number;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/**
 * Warms every case up, then times them in interleaved rounds (each round runs
 * every case once), so a change in machine load during the run falls on all
 * of them alike; the median round of each is reported.
 */
function measureAll(cases: Case[]): Rates[] {
  for (const { pass, inputs } of cases) sink += pass(inputs.first, inputs.second);
  const cpu: number[][] = cases.map(() => []);
  const wall: number[][] = cases.map(() => []);
  for (let round = 0; round < ROUNDS; round++) {
    cases.forEach(({ pass, inputs }, index) => {
      const startWall = process.hrtime.bigint();
      const startCpu = process.cpuUsage();
      sink += pass(inputs.first, inputs.second);
      const used = process.cpuUsage(startCpu);
      wall[index].push(INPUTS / (Number(process.hrtime.bigint() - startWall) / 1e9));
      cpu[index].push(INPUTS / ((used.user + used.system) / 1e6));
    });
  }
  return cases.map((_, index) => ({ cpu: median(cpu[index]), wall: median(wall[index]) }));
}

function main(): void {
  const json = process.argv.includes('--json');
  const next = random(0x1f97);
  const liquid = region1Inputs(next);
  const steam = region2Inputs(next);
  const steamEnthalpy: Inputs = {
    first: steam.first,
    second: steam.first.map((p, i) => enthalpyRegion2(p, steam.second[i])),
  };
  const saturation: Inputs = { first: new Float64Array(INPUTS), second: new Float64Array(INPUTS) };
  for (let i = 0; i < INPUTS; i++) saturation.first[i] = Math.exp(Math.log(0.001) + (Math.log(22.064) - Math.log(0.001)) * next());

  // Each case has its own loop calling the function directly: a loop shared
  // through a function parameter would see four callees and stop inlining.
  const cases: Case[] = [
    {
      name: 'h_pT_region1',
      inputs: liquid,
      pass: (p, T) => {
        let sum = 0;
        for (let i = 0; i < INPUTS; i++) sum += enthalpyRegion1(p[i], T[i]);
        return sum;
      },
    },
    {
      name: 'h_pT_region2',
      inputs: steam,
      pass: (p, T) => {
        let sum = 0;
        for (let i = 0; i < INPUTS; i++) sum += enthalpyRegion2(p[i], T[i]);
        return sum;
      },
    },
    {
      name: 'T_ph_region2',
      inputs: steamEnthalpy,
      pass: (p, h) => {
        let sum = 0;
        for (let i = 0; i < INPUTS; i++) sum += temperaturePHRegion2(p[i], h[i]);
        return sum;
      },
    },
    {
      name: 'Tsat_p',
      inputs: saturation,
      pass: (p) => {
        let sum = 0;
        for (let i = 0; i < INPUTS; i++) sum += saturationTemperatureRegion4(p[i]);
        return sum;
      },
    },
  ];

  const only = process.argv.indexOf('--only');
  const chosen = only >= 0 ? cases.filter((item) => item.name === process.argv[only + 1]) : cases;
  const rates = measureAll(chosen);
  const results = chosen.map((item, index) => ({ name: item.name, rates: rates[index] }));
  if (json) {
    for (const { name, rates } of results) console.log(JSON.stringify({ name, evals_per_s: Number(rates.cpu.toPrecision(3)) }));
  } else {
    console.log(`IAPWS-IF97 hot paths: ${INPUTS.toLocaleString('en-US')} inputs, median of ${ROUNDS} rounds, one thread`);
    console.log('Rates are per second of CPU time; on a busy machine wall-clock rates are lower, and both vary from run to run.');
    console.log('');
    console.log(`${'function'.padEnd(14)}${'evals/s (cpu)'.padStart(16)}${'ns/eval'.padStart(10)}${'evals/s (wall)'.padStart(17)}`);
    for (const { name, rates } of results) {
      const millions = (rate: number): string => `${(rate / 1e6).toFixed(2)} M`;
      console.log(
        `${name.padEnd(14)}${millions(rates.cpu).padStart(16)}${(1e9 / rates.cpu).toFixed(1).padStart(10)}${millions(rates.wall).padStart(17)}`,
      );
    }
    console.log('');
  }
  // Printed to stderr so --json output stays one line per function.
  console.error(`checksum ${sink.toPrecision(12)}`);
}

main();
