import {execFileSync} from 'node:child_process';
import {mkdtemp, readFile, rm, writeFile} from 'node:fs/promises';
import {createServer, type Server} from 'node:http';
import {tmpdir} from 'node:os';
import path from 'node:path';
import puppeteer, {type Browser} from 'puppeteer-core';
import {afterAll, beforeAll, describe, expect, test} from 'vitest';
import {openBrowser, type PdfBrowser, type PdfOptions} from '../../src/render/index.js';
import {findBrowser, LAUNCH_ARGS, printPdf, type PrintRecord} from '../../src/render/pdf.js';

/**
 * The PDF step prints with JavaScript off and every request other than data: and about: refused. A page that
 * tries to run a script, load an image over HTTP (from a server of our own that counts what it receives and from
 * the discard port 9) and read a local file must come out with the script not run and nothing loaded. Needs
 * Chromium and pdftotext (poppler-utils); skipped without a browser.
 */

const executable = findBrowser(null);
let hostname = '';
let server: Server;
let port = 0;
const received: string[] = [];
let dir = '';

const options: PdfOptions = {
  title: 'Sandbox',
  periodLabel: '2026-10',
  paper: 'A4',
  orientation: 'portrait',
  font: 'Liberation Sans',
  footer: null,
  date: '20261101',
};

function hostilePage(): string {
  return `<!DOCTYPE html><html><head><meta charset="utf-8">
<link rel="stylesheet" href="http://127.0.0.1:${port}/style.css">
<style>@import url("http://127.0.0.1:${port}/import.css"); body { background: url("file:///etc/hostname"); }</style>
</head><body>
<p id="status">SCRIPT-DID-NOT-RUN</p>
<p><img src="http://127.0.0.1:${port}/pixel.png" alt="LOCAL-SERVER-IMAGE-ALT"></p>
<p><img src="http://127.0.0.1:9/x.png" alt="PORT-NINE-IMAGE-ALT"></p>
<p><img src="file:///etc/hostname" alt="FILE-IMAGE-ALT"></p>
<iframe src="file:///etc/hostname" width="400" height="60"></iframe>
<object data="file:///etc/hostname" type="text/plain" width="400" height="60"></object>
<script>document.getElementById('status').textContent = 'SCRIPT-RAN';</script>
<script src="http://127.0.0.1:${port}/script.js"></script>
<noscript><p>NOSCRIPT-SHOWN</p></noscript>
</body></html>`;
}

async function pdfText(bytes: Uint8Array): Promise<string> {
  const file = path.join(dir, `page-${Math.random().toString(36).slice(2)}.pdf`);
  await writeFile(file, bytes);
  return execFileSync('pdftotext', ['-layout', file, '-'], {encoding: 'utf8'});
}

beforeAll(async () => {
  hostname = (await readFile('/etc/hostname', 'utf8')).trim();
  dir = await mkdtemp(path.join(tmpdir(), 'ebbflow-pdf-sandbox-'));
  server = createServer((req, res) => {
    received.push(req.url ?? '');
    res.end('document.getElementById("status").textContent = "REMOTE-SCRIPT-RAN";');
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  port = (server.address() as {port: number}).port;
});

afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await rm(dir, {recursive: true, force: true});
});

describe.skipIf(executable === null)('PDF sandbox', () => {
  test('openBrowser().pdf: no script runs, nothing is fetched, no local file is shown', async () => {
    const browser = (await openBrowser(null)) as PdfBrowser;
    let text = '';
    try {
      text = await pdfText(await browser.pdf(hostilePage(), options));
    } finally {
      await browser.close();
    }
    expect(text).toContain('SCRIPT-DID-NOT-RUN');
    expect(text).not.toContain('SCRIPT-RAN\n');
    expect(text).not.toMatch(/(?<!DID-NOT-)SCRIPT-RAN|REMOTE-SCRIPT-RAN/);
    // With JavaScript disabled the browser shows <noscript> content.
    expect(text).toContain('NOSCRIPT-SHOWN');
    // Broken images keep their alt text: the image was not loaded.
    expect(text).toContain('LOCAL-SERVER-IMAGE-ALT');
    expect(text).toContain('FILE-IMAGE-ALT');
    if (hostname.length >= 4) expect(text).not.toContain(hostname);
    expect(received).toEqual([]);
  });

  test('printPdf records every refused HTTP request; none reaches the server', async () => {
    let browser: Browser | undefined;
    const record: PrintRecord = {blocked: []};
    try {
      browser = await puppeteer.launch({executablePath: executable!, headless: true, args: LAUNCH_ARGS});
      await printPdf(browser, hostilePage(), options, record);
    } finally {
      await browser?.close();
    }
    expect(received).toEqual([]);
    const blocked = record.blocked.join('\n');
    expect(blocked).toContain(`http://127.0.0.1:${port}/pixel.png`);
    expect(blocked).toContain(`http://127.0.0.1:${port}/style.css`);
    expect(blocked).toContain('http://127.0.0.1:9/x.png');
    // file: URLs never reach the interception: Chromium itself refuses local resources to a page set with
    // setContent (about:blank origin). The first test shows the file's content does not appear.
    expect(blocked).not.toContain('file:///etc/hostname');
    // The external script is never even requested with JavaScript off, or is refused; either way it never arrives.
    expect(received.some((u) => u.includes('script.js'))).toBe(false);
  });
});
