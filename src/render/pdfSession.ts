import type {PdfBrowser, PdfOptions} from './pdf.js';

/**
 * The browsers of a run, one per browser setting of the packs it builds: the one owner of their life. A browser is
 * launched on first need (or earlier through `warm`, so that it starts while the series are analysed), shared by
 * every period and pack that names the same setting, and closed by `close`. The CLI keeps one session for a whole
 * batch; `build` opens its own when it is given none.
 *
 * Chromium and puppeteer load only when a browser is first needed (about a second of start-up otherwise).
 */
export interface PdfSession {
  /** Start launching the browser for `executable` (null: the one found on this machine), if not started yet. */
  warm(executable: string | null): void;
  /** The PDF of `html`, or why it is skipped (no browser found). A failed launch or print throws. */
  print(executable: string | null, html: string, options: PdfOptions): Promise<{pdf: Uint8Array} | {skipped: string}>;
  /** Close every browser this session launched. */
  close(): Promise<void>;
}

type Launch = {value: PdfBrowser | {missing: string}} | {error: unknown};

export function pdfSession(): PdfSession {
  const launches = new Map<string | null, Promise<Launch>>();
  // Each launch is settled at once into a value or an error, so a failure cannot go unhandled while it waits.
  const launch = (executable: string | null): Promise<Launch> => {
    let started = launches.get(executable);
    if (started === undefined) {
      started = import('./pdf.js')
        .then((m) => m.openBrowser(executable))
        .then(
          (value) => ({value}),
          (error: unknown) => ({error}),
        );
      launches.set(executable, started);
    }
    return started;
  };
  return {
    warm(executable) {
      void launch(executable);
    },
    async print(executable, html, options) {
      const launched = await launch(executable);
      if ('error' in launched) throw launched.error;
      if ('missing' in launched.value) return {skipped: launched.value.missing};
      return {pdf: await launched.value.pdf(html, options)};
    },
    async close() {
      const all = [...launches.values()];
      launches.clear();
      for (const launched of await Promise.all(all)) {
        if ('value' in launched && !('missing' in launched.value)) await launched.value.close();
      }
    },
  };
}
