/**
 * The demo's seeded year: hourly loads and ambient temperatures drawn from a seeded generator
 * (pure-rand xoroshiro128+), so every run gives the same year. Invented: no real site's record.
 */
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { AMBIENT_SEED, HOURS, YEAR_SEED } from './scenario';

const YEAR_START = Date.UTC(2025, 0, 1); // a Wednesday

/**
 * A year of hourly per-unit loads for a press shop: two shifts on weekdays (06–22 h), one on
 * Saturday morning, a base of compressors and lighting at night and on Sunday, a lunch dip, a
 * summer cooling bump, a two-week August shutdown and the Christmas week, plus ±3 % noise from a
 * seeded generator (pure-rand xoroshiro128+) so every run gives the same year.
 */
export function yearOfLoads(seed = YEAR_SEED): Float64Array {
  const rng = xoroshiro128plus(seed);
  const loads = new Float64Array(HOURS);
  for (let h = 0; h < HOURS; h++) {
    const t = new Date(YEAR_START + h * 3_600_000);
    const day = Math.floor(h / 24); // 0 = 1 January
    const hour = t.getUTCHours();
    const weekday = t.getUTCDay(); // 0 Sunday … 6 Saturday
    const shutdown = (day >= 215 && day < 229) || day >= 358; // 4–17 August, 25–31 December
    const base = 0.16;
    let work = 0;
    if (!shutdown && weekday >= 1 && weekday <= 5 && hour >= 6 && hour < 22) work = hour < 14 ? 0.62 : 0.55;
    if (!shutdown && weekday === 6 && hour >= 6 && hour < 14) work = 0.38;
    if (work > 0 && hour === 12) work -= 0.08; // lunch
    // Cooling in summer afternoons, heating and lighting in winter: peaks in July, low in April/October.
    const season = Math.cos((2 * Math.PI * (day - 196)) / 365);
    const climate = season > 0 ? 0.1 * season * (hour >= 11 && hour < 19 ? 1 : 0.4) : -0.04 * season;
    const noise = (uniformFloat64(rng) - 0.5) * 0.06;
    loads[h] = Math.round(Math.min(1.15, Math.max(0.05, base + work + climate + noise)) * 1000) / 1000;
  }
  return loads;
}

/**
 * A year of hourly air temperatures for a temperate inland campus, °C: a mean of 11 °C, seasons of
 * ±8.5 K peaking in late July, a daily swing of ±3 K in winter to ±5.5 K in summer with the warmest
 * hour at 15 h, and weather — spells a few days long — as a first-order autoregressive drift
 * (each hour keeps 99 % of the last hour's departure; about ±2.4 K standard deviation) plus ±0.3 K
 * noise, from a seeded generator (pure-rand xoroshiro128+). Invented: no real site's record. The
 * figures are of the kind a temperate climate has (common practice); the seeded year runs from
 * −4.6 to 28.4 °C with a mean of 10.4 °C.
 */
export function yearOfAmbients(seed = AMBIENT_SEED): Float64Array {
  const rng = xoroshiro128plus(seed);
  const ambients = new Float64Array(HOURS);
  let weather = 0;
  for (let h = 0; h < HOURS; h++) {
    const day = Math.floor(h / 24);
    const hour = h % 24;
    const season = Math.cos((2 * Math.PI * (day - 200)) / 365); // 1 on 20 July, −1 in mid January
    const swing = 4.25 + 1.25 * season;
    const daily = swing * Math.cos((2 * Math.PI * (hour - 15)) / 24);
    weather = 0.99 * weather + (uniformFloat64(rng) - 0.5) * 1.2;
    const noise = (uniformFloat64(rng) - 0.5) * 0.6;
    ambients[h] = Math.round((11 + 8.5 * season + daily + weather + noise) * 10) / 10;
  }
  return ambients;
}

export const hourStart = (h: number): Date => new Date(YEAR_START + h * 3_600_000);

