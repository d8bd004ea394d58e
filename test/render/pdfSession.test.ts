import {describe, expect, test} from 'vitest';
import {pdfSession} from '../../src/render/pdfSession.js';

const options = {
  title: 't',
  periodLabel: '2026-10',
  paper: 'A4' as const,
  orientation: 'portrait' as const,
  font: 'Liberation Sans',
  footer: null,
  locale: 'en-GB',
  tagged: false,
  date: '20261101',
  outline: [],
};

describe('pdfSession', () => {
  test('a session that is never used launches nothing and closes at once', async () => {
    await expect(pdfSession().close()).resolves.toBeUndefined();
  });

  test('a missing browser gives the reason the PDF is skipped, every time it is asked', async () => {
    const session = pdfSession();
    session.warm('/nonexistent/chrome');
    const first = await session.print('/nonexistent/chrome', '<p>x</p>', options);
    const second = await session.print('/nonexistent/chrome', '<p>y</p>', options);
    expect(first).toEqual({skipped: expect.stringMatching(/^PDF skipped: the browser named in the pack/)});
    expect(second).toEqual(first);
    await session.close();
  });
});
