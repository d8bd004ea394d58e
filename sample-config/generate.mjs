// Generates the demo data of Tarnwick Outdoor Co., an invented regional outdoor-gear retailer.
//
//   node sample-config/generate.mjs [FOLDER]       (default: sample-config/data)
//
// Writes sample-config/data/trading.csv (wide, monthly), data/web.csv (long, monthly, dates like `Oct 2026`),
// data/quarterly.csv (wide, quarterly, `;` delimiter and `,` decimal mark), data/repairs.parquet (the repair
// workshop's job log, one row per finished job with its time, written through the embedded DuckDB) and
// data/budget.xlsx (the sales budget as the finance team keeps it, and a cost plan sheet with the months across; a
// workbook written with exceljs). Node and the
// project's own dependencies, seeded PRNG: the same script always writes the same CSV and Parquet bytes and the same
// workbook cells.
//
// What is planted (the report should find these; README.md lists them too):
//   Business cycle (multiplicative, % deviation from trend; extremes exactly at these months):
//     peak   2019-04  +3%
//     trough 2020-05  -9%   (regional slowdown)
//     peak   2022-10  +6%
//     trough 2024-07  -4%
//     2026-10 recovering, +2% and rising (no turn after 2024-07)
//   Level shift: new shop opens 2021-04 (net sales +7%, footfall +9%, payroll +8%, inventory +6% from then on).
//   One-off spikes: flash sale 2023-11 (net sales +14%, web orders +35%, web sessions +20%);
//     stock-count correction 2024-03 (inventory +18% for that month only);
//     faulty jacket batch 2022-01 (returns rate +3.5 percentage points);
//     social-media mention 2025-06 (web sessions +40%, web orders only +8%).
//   Working days: shop series scale with the month's trading-day weight (Mon–Fri 1.0, Sat 1.5, Sun 0.5;
//     closed 25-26 Dec and 1 Jan); web series scale with the number of days in the month.
//   Easter: the 10 days before Easter Sunday lift sales by 5% of a month's sales, split between March and April
//     by how many of those days fall in each month (Easter dates by the Gregorian computus).
//   Gaps: footfall is blank for 2019-08, 2023-02 and 2023-03 (door counter fault).
//   Budget: sales_budget runs to 2027-03 (the end of fiscal year 2026/27; the fiscal year starts in April), and so
//     do payroll_budget and marketing_budget (cost lines: below budget is favourable). The sales budget is also in
//     budget.xlsx, which the monthly pack reads, and so are the cost budgets, on its sheet "Cost plan" (one row per
//     account, the months across).
//   Structure: net sales are the sum of three shop regions (North, Lakes, Coast), each rounded to 0.1, and the web
//     store (the rest of net sales, also in tenths), so the parts add up exactly; cost of goods sold (cogs) gives a gross margin near 46%, falling by
//     about a point in the 2023-11 flash sale; transactions give the average basket (net sales / transactions).
//     These use a second seeded generator, so every other series keeps its values.
//   Repairs: about 9 jobs a day (more in spring and before Christmas, none on the closing days), 2017-12-01 to
//     2026-10-31 (from a Friday, so that the first month is whole); each job finishes between 09:00 and 17:59
//     and costs EUR 18–120.
import {mkdirSync, mkdtempSync, rmSync, writeFileSync} from 'node:fs';
import {tmpdir} from 'node:os';
import {dirname, join, resolve} from 'node:path';
import {fileURLToPath} from 'node:url';
import {DuckDBInstance} from '@duckdb/node-api';
import ExcelJS from 'exceljs';

const here = dirname(fileURLToPath(import.meta.url));
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** mulberry32: small seeded PRNG, uniform on [0, 1). */
function mulberry32(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by Box–Muller from a uniform generator. */
function normal(rng) {
  const u = Math.max(rng(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng());
}

/**
 * Easter Sunday (Gregorian computus, anonymous algorithm): {month, day}. The same algorithm as src/time/easter.ts,
 * kept here so the demo data can be regenerated with plain Node before anything is built; the generator plants the
 * effect, the engine must find it independently.
 */
function easter(year) {
  const a = year % 19;
  const b = Math.floor(year / 100);
  const c = year % 100;
  const d = Math.floor(b / 4);
  const e = b % 4;
  const f = Math.floor((b + 8) / 25);
  const g = Math.floor((b - f + 1) / 3);
  const h = (19 * a + b - d - g + 15) % 30;
  const i = Math.floor(c / 4);
  const k = c % 4;
  const l = (32 + 2 * e + 2 * i - h - k) % 7;
  const m = Math.floor((a + 11 * h + 22 * l) / 451);
  const month = Math.floor((h + l - 7 * m + 114) / 31);
  const day = ((h + l - 7 * m + 114) % 31) + 1;
  return {month, day};
}

const daysInMonth = (y, m) => new Date(Date.UTC(y, m, 0)).getUTCDate();

/** Trading-day weight of a month: Mon–Fri 1, Sat 1.5, Sun 0.5; shops shut on 25–26 Dec and 1 Jan. */
function tradingWeight(y, m) {
  const weights = [0.5, 1, 1, 1, 1, 1, 1.5]; // getUTCDay: 0 = Sunday
  let w = 0;
  for (let d = 1; d <= daysInMonth(y, m); d++) {
    if ((m === 12 && (d === 25 || d === 26)) || (m === 1 && d === 1)) continue;
    w += weights[new Date(Date.UTC(y, m - 1, d)).getUTCDay()];
  }
  return w;
}
// Average monthly trading weight (over a 28-year calendar cycle), to centre the effect on 1.
const MEAN_WEIGHT = (() => {
  let s = 0;
  for (let y = 2000; y < 2028; y++) for (let m = 1; m <= 12; m++) s += tradingWeight(y, m);
  return s / (28 * 12);
})();

/** Share of the 10 days before Easter Sunday that fall in March and in April. */
function easterShares(year) {
  const {month, day} = easter(year);
  const sunday = Date.UTC(year, month - 1, day);
  let march = 0;
  for (let k = 1; k <= 10; k++) if (new Date(sunday - k * 86400000).getUTCMonth() === 2) march++;
  return {march: march / 10, april: 1 - march / 10};
}

// Business cycle knots: month index (year*12 + month-1) and % deviation; cosine interpolation between knots
// keeps each knot an exact local extreme.
const mi = (y, m) => y * 12 + m - 1;
const KNOTS = [
  [mi(2015, 1), 0],
  [mi(2019, 4), 3],
  [mi(2020, 5), -9],
  [mi(2022, 10), 6],
  [mi(2024, 7), -4],
  [mi(2027, 7), 4],
];
function cyclePct(t) {
  for (let k = 0; k < KNOTS.length - 1; k++) {
    const [t0, v0] = KNOTS[k];
    const [t1, v1] = KNOTS[k + 1];
    if (t >= t0 && t <= t1) {
      const x = (t - t0) / (t1 - t0);
      return v0 + ((v1 - v0) * (1 - Math.cos(Math.PI * x))) / 2;
    }
  }
  return 0;
}

// Seasonal factors for outdoor gear (spring/summer peak, December gifts), normalised to mean 1.
const RAW_SEASON = [0.74, 0.78, 0.96, 1.06, 1.14, 1.17, 1.13, 1.04, 0.93, 0.88, 0.96, 1.28];
const SEASON = RAW_SEASON.map((s) => (s * 12) / RAW_SEASON.reduce((a, b) => a + b, 0));

const rng = mulberry32(20261031);
// The breakdown of net sales and the cost lines' budgets draw from their own generator (see the header).
const split = mulberry32(20261101);
const round = (x, digits) => {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
};

const START = mi(2018, 1);
const END = mi(2026, 10);
const BUDGET_END = mi(2027, 3);
const SHOP_OPENING = mi(2021, 4);

const trading = [];
const web = [];
for (let t = START; t <= BUDGET_END; t++) {
  const y = Math.floor(t / 12);
  const m = (t % 12) + 1;
  const years = (t - START) / 12;
  const season = SEASON[m - 1];
  const cycle = 1 + cyclePct(t) / 100;
  const working = tradingWeight(y, m) / MEAN_WEIGHT;
  const days = daysInMonth(y, m) / 30.436875;
  const shares = easterShares(y);
  const easterLift = m === 3 ? 1 + 0.05 * shares.march : m === 4 ? 1 + 0.05 * shares.april : 1;
  const shop = t >= SHOP_OPENING;
  const label = `${y}-${String(m).padStart(2, '0')}`;

  // Budget: planned trend and seasonality with a 4% stretch, no cycle and no noise; set per fiscal year (April).
  const fyStart = m >= 4 ? mi(y, 4) : mi(y - 1, 4);
  const plannedYears = (fyStart - START) / 12 + 0.5;
  const budget = 1480 * Math.pow(1.035, plannedYears) * (t >= SHOP_OPENING ? 1.07 : 1) * 1.04 * season;
  // Cost budgets: planned 3.5% (payroll) and 4% (marketing) a year, with the planned shape of the year.
  const payrollBudget = 405 * Math.pow(1.035, plannedYears) * (1 + 0.06 * (season - 1)) * (t >= SHOP_OPENING ? 1.08 : 1) * (m === 12 ? 1.05 : 1);
  const marketingBudget = 95 * Math.pow(1.04, plannedYears) * (1 + 0.6 * (season - 1));
  const budgets = {
    sales_budget: round(budget, 1),
    payroll_budget: round(payrollBudget, 1),
    marketing_budget: round(marketingBudget, 1),
  };
  if (t > END) {
    trading.push({month: label, ...budgets});
    continue;
  }

  const noise = (sd) => 1 + sd * normal(rng);
  const netSales =
    1480 *
    Math.pow(1.035, years) *
    season *
    cycle *
    working *
    easterLift *
    (shop ? 1.07 : 1) *
    (t === mi(2023, 11) ? 1.14 : 1) *
    noise(0.015);
  const footfall =
    61000 *
    Math.pow(1.012, years) *
    Math.pow(season, 0.8) *
    Math.pow(cycle, 0.7) *
    working *
    easterLift *
    (shop ? 1.09 : 1) *
    noise(0.02);
  const basket = 38.5 * Math.pow(1.028, years) * Math.pow(season, 0.35) * Math.pow(cycle, 0.4) * noise(0.012);
  const returnsRate =
    6.2 + 0.8 * Math.sin((2 * Math.PI * (m - 2)) / 12) + (t === mi(2022, 1) ? 3.5 : 0) + 0.25 * normal(rng);
  const payroll =
    410 * Math.pow(1.038, years) * (1 + 0.06 * (season - 1)) * (shop ? 1.08 : 1) * (m === 12 ? 1.05 : 1) * noise(0.008);
  // Stock is built ahead of the peaks: month-end inventory leads sales seasonality by about a month.
  const inventory =
    2650 *
    Math.pow(1.03, years) *
    (1 + 0.35 * (SEASON[m % 12] - 1)) *
    Math.pow(cycle, 1.5) *
    (shop ? 1.06 : 1) *
    (t === mi(2024, 3) ? 1.18 : 1) *
    noise(0.012);
  const marketing = 92 * Math.pow(1.04, years) * (1 + 0.6 * (season - 1)) * Math.pow(cycle, 1.2) * noise(0.05);
  const webSessions =
    182000 *
    Math.pow(1.09, years) *
    Math.pow(season, 0.9) *
    Math.pow(cycle, 0.6) *
    days *
    (t === mi(2023, 11) ? 1.2 : 1) *
    (t === mi(2025, 6) ? 1.4 : 1) *
    noise(0.03);
  const webOrders =
    webSessions *
    0.021 *
    Math.pow(1.02, years) *
    Math.pow(season, 0.2) *
    easterLift *
    (t === mi(2023, 11) ? 1.35 / 1.2 : 1) *
    (t === mi(2025, 6) ? 1.08 / 1.4 : 1) *
    noise(0.02);

  // Net sales by region and channel: the web store's share grows from 12% to about 20%; the shops split
  // 45 / 33 / 22 between North, Lakes and Coast (Lakes gains the new shop of 2021-04), each with its own noise.
  const webShare = 0.12 + 0.009 * years;
  const shopShares = [0.45, 0.33 * (shop ? 1.2 : 1), 0.22].map((s) => s * (1 + 0.02 * normal(split)));
  const shopTotal = shopShares.reduce((a, b) => a + b, 0);
  const [north, lakes, coast] = shopShares.map((s) => round((netSales * (1 - webShare) * s) / shopTotal, 1));
  // Web sales are what the shops leave of net sales (in tenths, so the parts add up exactly to what is written).
  const sales = round(netSales, 1);
  const webSales = Math.round(sales * 10 - north * 10 - lakes * 10 - coast * 10) / 10;
  const margin = 0.46 - 0.004 * Math.sin((2 * Math.PI * (m - 1)) / 12) - (t === mi(2023, 11) ? 0.012 : 0);
  const cogs = round(sales * (1 - margin * (1 + 0.01 * normal(split))), 1);

  const gap = t === mi(2019, 8) || t === mi(2023, 2) || t === mi(2023, 3);
  trading.push({
    month: label,
    net_sales: sales,
    sales_north: north,
    sales_lakes: lakes,
    sales_coast: coast,
    web_sales: webSales,
    cogs,
    transactions: Math.round((sales * 1000) / basket),
    footfall: gap ? '' : Math.round(footfall),
    avg_basket: round(basket, 2),
    returns_rate: round(returnsRate, 2),
    payroll: round(payroll, 1),
    inventory: round(inventory, 1),
    marketing: round(marketing, 1),
    ...budgets,
  });
  const when = `${MONTHS[m - 1]} ${y}`;
  web.push([when, 'Web sessions', Math.round(webSessions)]);
  web.push([when, 'Web orders', Math.round(webOrders)]);
}

// Quarterly regional summaries, 2016Q1–2026Q3: the same cycle, quarterly seasonality, one regional shift.
const quarterly = [];
const REGIONS = [
  ['sales_north', 1450, 0.025],
  ['sales_lakes', 1120, 0.03],
  ['sales_coast', 980, 0.04],
  ['sales_online', 610, 0.1],
];
const Q_SEASON = [0.86, 1.1, 1.06, 0.98];
for (let q = 2016 * 4; q <= 2026 * 4 + 2; q++) {
  const y = Math.floor(q / 4);
  const quarter = (q % 4) + 1;
  const midMonth = mi(y, quarter * 3 - 1);
  const years = (q - 2016 * 4) / 4;
  const cycle = 1 + cyclePct(midMonth) / 100;
  const row = {quarter: `${y}-Q${quarter}`};
  for (const [name, base, growth] of REGIONS) {
    const season = name === 'sales_online' ? [0.92, 1.0, 0.96, 1.12][quarter - 1] : Q_SEASON[quarter - 1];
    const opening = name === 'sales_lakes' && midMonth >= SHOP_OPENING ? 1.2 : 1;
    row[name] = round(3 * base * Math.pow(1 + growth, years) * season * cycle * opening * (1 + 0.02 * normal(rng)), 1);
  }
  row.gross_margin_pct = round(44.5 - 0.25 * (y - 2016) + [-1.2, 0.6, 0.9, -0.3][quarter - 1] + 0.4 * normal(rng), 2);
  row.headcount = Math.round(
    (118 + 2.1 * years) * (midMonth >= SHOP_OPENING ? 1.11 : 1) * Math.pow(cycle, 0.5) * (1 + 0.015 * normal(rng)),
  );
  quarterly.push(row);
}

function wideCsv(rows, delimiter = ',', decimal = '.') {
  const columns = [...new Set(rows.flatMap((r) => Object.keys(r)))];
  const cell = (v) => (v === undefined || v === '' ? '' : typeof v === 'number' ? String(v).replace('.', decimal) : v);
  return [columns.join(delimiter), ...rows.map((r) => columns.map((c) => cell(r[c])).join(delimiter))].join('\n') + '\n';
}

const dataDir = process.argv[2] ? resolve(process.argv[2]) : join(here, 'data');
mkdirSync(dataDir, {recursive: true});
writeFileSync(join(dataDir, 'trading.csv'), wideCsv(trading));
writeFileSync(join(dataDir, 'web.csv'), ['date,series,value', ...web.map((r) => r.join(','))].join('\n') + '\n');
writeFileSync(join(dataDir, 'quarterly.csv'), wideCsv(quarterly, ';', ','));

// Repair workshop job log: one row per finished job. Its own seeded generator, so the files above do not change.
const repairRng = mulberry32(20171201);
const REPAIR_SEASON = [0.7, 0.75, 1.05, 1.25, 1.2, 1.05, 0.95, 0.9, 1.05, 1.1, 1.0, 1.0];
const SHOPS = ['Harrowgate', 'Millbrook', 'Tarn Quay', 'Westfell'];
const repairs = ['done_at,shop,amount'];
for (let day = Date.UTC(2017, 11, 1); day <= Date.UTC(2026, 9, 31); day += 86_400_000) {
  const date = new Date(day);
  const [y, m, d] = [date.getUTCFullYear(), date.getUTCMonth() + 1, date.getUTCDate()];
  if ((m === 12 && (d === 25 || d === 26)) || (m === 1 && d === 1)) continue;
  const t = mi(y, m);
  const weekday = [0.6, 1, 1, 1, 1.05, 1.1, 1.4][date.getUTCDay()];
  const mean = 9 * REPAIR_SEASON[m - 1] * Math.pow(1.02, (t - START) / 12) * Math.pow(1 + cyclePct(t) / 100, 0.5) * weekday;
  const jobs = Math.max(0, Math.round(mean + Math.sqrt(mean) * normal(repairRng)));
  const times = Array.from({length: jobs}, () => 9 * 60 + Math.floor(repairRng() * 540)).sort((a, b) => a - b);
  for (const minute of times) {
    const at = `${date.toISOString().slice(0, 10)} ${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}:00`;
    const shop = SHOPS[Math.floor(repairRng() * SHOPS.length)];
    repairs.push(`${at},${shop},${(18 + 102 * repairRng() ** 2).toFixed(2)}`);
  }
}
const scratch = mkdtempSync(join(tmpdir(), 'tarnwick-'));
try {
  writeFileSync(join(scratch, 'repairs.csv'), repairs.join('\n') + '\n');
  const duck = await (await DuckDBInstance.create(':memory:')).connect();
  const quote = (p) => `'${p.replace(/'/g, "''")}'`;
  await duck.run(
    `COPY (SELECT done_at::TIMESTAMP AS done_at, shop, amount::DECIMAL(8,2) AS amount FROM read_csv(${quote(join(scratch, 'repairs.csv'))}, ` +
      `header = true, columns = {'done_at': 'VARCHAR', 'shop': 'VARCHAR', 'amount': 'VARCHAR'})) ` +
      `TO ${quote(join(dataDir, 'repairs.parquet'))} (FORMAT parquet, COMPRESSION zstd, ROW_GROUP_SIZE 100000)`,
  );
  duck.closeSync();
} finally {
  rmSync(scratch, {recursive: true, force: true});
}

// The sales budget as finance keeps it: a workbook with two title rows above the header, real date cells.
const book = new ExcelJS.Workbook();
book.creator = 'Finance team, Tarnwick Outdoor Co.';
book.created = book.modified = new Date(Date.UTC(2026, 2, 31));
const sheet = book.addWorksheet('Budget');
sheet.addRow(['Tarnwick Outdoor Co. — sales budget']);
sheet.addRow(['EUR k; fiscal years start in April']);
sheet.addRow(['Month', 'Sales budget']);
for (const r of trading) {
  const [y, m] = r.month.split('-').map(Number);
  sheet.addRow([new Date(Date.UTC(y, m - 1, 1)), r.sales_budget]);
}
sheet.getColumn(1).numFmt = 'mmm yyyy';
sheet.getColumn(1).width = 12;
// The cost budgets as a plan sheet: one row per account, the months across (date cells), a unit column before them.
const plan = book.addWorksheet('Cost plan');
plan.addRow(['Tarnwick Outdoor Co. — cost plan, EUR k']);
const firstDay = (month) => {
  const [y, m] = month.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, 1));
};
plan.addRow(['Account', 'Unit', ...trading.map((r) => firstDay(r.month))]);
plan.addRow(['Payroll', 'EUR k', ...trading.map((r) => r.payroll_budget)]);
plan.addRow(['Marketing', 'EUR k', ...trading.map((r) => r.marketing_budget)]);
plan.getRow(2).numFmt = 'mmm yyyy';
await book.xlsx.writeFile(join(dataDir, 'budget.xlsx'));
