// Opens a WindScript HTML report in headless Chromium (Debian's /usr/bin/chromium, driven by
// playwright-core: no browser download) and checks that its script runs without errors, that
// it fetches nothing, and that moving the time slider and pressing Play change the animation
// frame. Prints "ok: ..." or "FAIL: ..." per check; report_browser.sh counts them.
// Usage: node report_browser.cjs REPORT.html [SCREENSHOT.png]
'use strict';
const { chromium } = require('playwright-core');
const path = require('path');

const [report, screenshot] = process.argv.slice(2);
const results = [];
const check = (name, ok, detail = '') => results.push({ name, ok: !!ok, detail });

(async () => {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM || '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
      '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1000, height: 1400 } });
    const errors = [];
    const requests = [];
    page.on('pageerror', e => errors.push('page error: ' + e.message));
    page.on('console', m => { if (m.type() === 'error') errors.push('console error: ' + m.text()); });
    page.on('request', r => { if (!r.url().startsWith('file:')) requests.push(r.url()); });
    const name = path.basename(report);

    await page.goto('file://' + path.resolve(report), { waitUntil: 'load' });
    const ready = await page.waitForFunction(() => document.getElementById('ws-animation')?.dataset.ready === 'true', null, { timeout: 10000 })
      .then(() => true, () => false);
    check(`${name}: the page's script ran to the end`, ready);
    check(`${name}: no script errors`, errors.length === 0, errors.join('; '));
    const sections = await page.$$eval('section', s => s.map(x => x.id));
    const missing = ['summary', 'rotating-field', 'layout', 'star', 'mmf', 'spectrum', 'field', 'diagnostics', 'assumptions', 'cautions']
      .filter(id => !sections.includes(id));
    check(`${name}: every section is there`, missing.length === 0, 'missing ' + missing.join(', '));
    const svgs = await page.$$eval('section svg', s => s.filter(x => x.getBoundingClientRect().width > 100).length);
    check(`${name}: every figure rendered (6 visible SVGs)`, svgs === 6, `found ${svgs}`);

    const frame = () => page.$eval('#ws-animation', f => Number(f.dataset.frame));
    const stair = () => page.$eval('#ws-stair', p => p.getAttribute('d'));
    check(`${name}: the animation starts at frame 0`, (await frame()) === 0 && (await page.evaluate(() => window.windscriptReport.frame)) === 0);

    // Move the time slider as a user would: focus it and press the arrow key.
    const before = await stair();
    await page.focus('#ws-time');
    for (let i = 0; i < 9; i++) await page.keyboard.press('ArrowRight');
    const moved = await frame();
    check(`${name}: moving the time slider changes the frame`, moved === 9, `frame ${moved}`);
    check(`${name}: the page's state agrees with the figure`, (await page.evaluate(() => window.windscriptReport.frame)) === moved);
    const isDc = await page.evaluate(() => JSON.parse(document.getElementById('ws-frames').textContent).drives[0].period === null);
    if (!isDc) check(`${name}: the MMF curve changes with the frame (AC drive)`, (await stair()) !== before);

    // Play advances the frame by itself; Pause stops it.
    await page.click('#ws-play');
    await page.waitForTimeout(600);
    const playing = await frame();
    check(`${name}: Play advances the animation`, playing !== moved, `frame ${playing}`);
    await page.click('#ws-play');
    const paused = await frame();
    await page.waitForTimeout(300);
    check(`${name}: Pause stops it`, (await frame()) === paused && !(await page.evaluate(() => window.windscriptReport.playing)));

    check(`${name}: nothing was fetched from the network`, requests.length === 0, requests.join(' '));
    check(`${name}: still no script errors after interaction`, errors.length === 0, errors.join('; '));
    if (screenshot) await page.screenshot({ path: screenshot, fullPage: true });
  } catch (e) {
    check('browser session', false, e.message);
  } finally {
    await browser.close();
  }
  for (const r of results) console.log(`${r.ok ? 'ok' : 'FAIL'}: ${r.name}${r.detail && !r.ok ? ' (' + r.detail + ')' : ''}`);
  process.exit(results.every(r => r.ok) ? 0 : 1);
})();
