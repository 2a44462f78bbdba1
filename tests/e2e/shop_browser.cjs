// Opens a WindScript shop sheet in headless Chromium (Debian's /usr/bin/chromium, driven by
// playwright-core) with JavaScript disabled, and checks it against the CSV tables written with
// it and against the model's coil count: every table is on the page with its CSV's rows, the
// developed diagram draws every coil, link, jumper, lead and terminal, nothing is fetched, and in
// print layout the diagram fits one landscape page. Prints "ok: ..." or "FAIL: ..." per check.
// Usage: node shop_browser.cjs SHEET.html CSV_DIR MODEL_COILS [SCREENSHOT_PREFIX]
'use strict';
const { chromium } = require('playwright-core');
const fs = require('fs');
const path = require('path');

const [sheet, csvDir, modelCoils, shotPrefix] = process.argv.slice(2);
const results = [];
const check = (name, ok, detail = '') => results.push({ name, ok: !!ok, detail });

// RFC 4180 rows (quoted cells may hold commas, quotes and line breaks).
function csvRows(text) {
  const rows = [];
  let row = [], cell = '', quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') { cell += '"'; i++; }
      else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') { row.push(cell); cell = ''; }
    else if (c === '\n') { row.push(cell); rows.push(row); row = []; cell = ''; }
    else cell += c;
  }
  if (cell !== '' || row.length) { row.push(cell); rows.push(row); }
  return rows;
}

(async () => {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM || '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
      '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const name = path.basename(path.dirname(sheet)) + '/' + path.basename(sheet);
  try {
    const context = await browser.newContext({ javaScriptEnabled: false, viewport: { width: 1500, height: 1000 } });
    const page = await context.newPage();
    const requests = [];
    page.on('request', r => { if (!r.url().startsWith('file:')) requests.push(r.url()); });
    await page.goto('file://' + path.resolve(sheet), { waitUntil: 'load' });

    check(`${name}: the page has no script`, (await page.$$('script')).length === 0);

    const tables = {};
    for (const file of fs.readdirSync(csvDir).filter(f => f.endsWith('.csv'))) {
      const rows = csvRows(fs.readFileSync(path.join(csvDir, file), 'utf8'));
      tables[path.basename(file, '.csv')] = { header: rows[0], rows: rows.slice(1) };
    }
    const expected = ['phases', 'leads', 'points', 'coils', 'groups', 'connections'];
    check(`${name}: a CSV file for every table`, expected.every(id => tables[id]), 'have ' + Object.keys(tables).join(', '));
    for (const id of expected) {
      const t = tables[id];
      if (!t) continue;
      const onPage = await page.$(`table#${id}`);
      check(`${name}: the ${id} table is on the page`, onPage !== null);
      if (!onPage) continue;
      const header = await page.$$eval(`table#${id} thead th`, ths => ths.map(th => th.textContent));
      check(`${name}: the ${id} table has the CSV's columns`, JSON.stringify(header) === JSON.stringify(t.header), header.join('|'));
      const body = await page.$$eval(`table#${id} tbody tr`, trs => trs.map(tr => [...tr.children].map(td => td.textContent)));
      const cells = t.rows.length === 0 ? [] : body;
      check(`${name}: the ${id} table has the CSV's ${t.rows.length} rows, cell for cell`, JSON.stringify(cells) === JSON.stringify(t.rows),
        `page ${cells.length} rows`);
    }

    const svg = await page.$('#diagram svg');
    check(`${name}: the developed diagram is drawn`, svg !== null && (await svg.boundingBox()).width > 800);
    const count = sel => page.$$eval(`#diagram svg ${sel}`, els => els.length);
    const distinct = (sel, attr) => page.$$eval(`#diagram svg ${sel}`, (els, a) => new Set(els.map(e => e.getAttribute(a))).size, attr);
    const coils = await count('[data-coil]');
    check(`${name}: the diagram draws every coil of the model (${modelCoils})`, coils === Number(modelCoils) && (await distinct('[data-coil]', 'data-coil')) === coils, `drew ${coils}`);
    if (tables.coils) check(`${name}: ... one per row of the coil table`, coils === tables.coils.rows.length);
    if (tables.groups) {
      const links = tables.groups.rows.reduce((n, r) => n + Number(r[3]) - 1, 0);
      check(`${name}: the diagram draws every link between coils of a group (${links})`, (await count('[data-link]')) === links, `drew ${await count('[data-link]')}`);
    }
    if (tables.connections) {
      const jumpers = await count('[data-jumper]');
      check(`${name}: the diagram draws every jumper (${tables.connections.rows.length})`, jumpers === tables.connections.rows.length && (await distinct('[data-jumper]', 'data-jumper')) === jumpers, `drew ${jumpers}`);
    }
    if (tables.leads) {
      const leads = await count('[data-lead]');
      check(`${name}: the diagram draws every lead (${tables.leads.rows.length})`, leads === tables.leads.rows.length, `drew ${leads}`);
      const marks = [...new Set(tables.leads.rows.map(r => r[1]))].sort();
      const terminals = (await page.$$eval('#diagram svg [data-terminal]', els => els.map(e => e.getAttribute('data-terminal')))).sort();
      check(`${name}: the diagram labels every terminal mark (${marks.join(' ')})`, JSON.stringify(terminals) === JSON.stringify(marks), terminals.join(' '));
    }
    const slots = await count('[data-slot]');
    const slotCount = Number((await page.$eval('.facts', ul => ul.textContent)).match(/slots (\d+)/)[1]);
    check(`${name}: the diagram numbers every slot (${slotCount})`, slots === slotCount, `numbered ${slots}`);
    check(`${name}: nothing was fetched from the network`, requests.length === 0, requests.join(' '));
    if (shotPrefix) await page.screenshot({ path: shotPrefix + '.png', fullPage: true });

    // Print layout: the diagram fits one landscape page of the smaller paper (259 x 190 mm inside the margins).
    await page.emulateMedia({ media: 'print' });
    await page.setViewportSize({ width: Math.round(259 / 25.4 * 96), height: Math.round(190 / 25.4 * 96) });
    const box = await (await page.$('#diagram svg')).boundingBox();
    check(`${name}: in print the diagram fits a landscape page`, box.width <= 259 / 25.4 * 96 + 1 && box.height <= 190 / 25.4 * 96, `${Math.round(box.width)} x ${Math.round(box.height)} px`);
    if (shotPrefix) await page.screenshot({ path: shotPrefix + '-print.png', fullPage: true });
  } catch (e) {
    check(`${name}: browser session`, false, e.message);
  } finally {
    await browser.close();
  }
  for (const r of results) console.log(`${r.ok ? 'ok' : 'FAIL'}: ${r.name}${r.detail && !r.ok ? ' (' + r.detail + ')' : ''}`);
  process.exit(results.every(r => r.ok) ? 0 : 1);
})();
