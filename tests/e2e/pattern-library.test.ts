// End-to-end: the owner starts a collar from its preset, changes the girth and watches the
// in-browser preview redraw, saves with a note, invites an apprentice who accepts from the
// fake mailbox, and the apprentice gets the bench (drawing, summary, Print) with the values
// folded away and read-only.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { startTestServer } from '../helpers/test-server.ts';
import { ensureClientBuilt } from './support/build-client.ts';
import { signUpInBrowser } from './support/shop-session.ts';
import { launchBrowser, type TestBrowser } from './support/browser.ts';
import { snap, snapElement } from './support/screenshots.ts';

type Server = Awaited<ReturnType<typeof startTestServer>>;

const apprentice = { name: 'Ilse Park', email: 'ilse@harrowfinch.example', password: 'first awl and a pricking iron' };
const owner = { name: 'Maren Finch', shopName: 'Harrow & Finch Leatherworks', email: 'maren@harrowfinch.example', password: 'oak-tanned bridle 1892' };

const signUp = (page: Page, base: string) => signUpInBrowser(page, base, owner);

/** The strap blank length the preview states, e.g. "21 in". */
async function blankText(page: Page): Promise<string> {
  return (await page.getByTestId('strap-blank').locator('strong').textContent()) ?? '';
}

describe('the pattern library in the browser', () => {
  let server: Server;
  let browser: TestBrowser;
  let page: Page;
  let patternUrl = '';
  let inviteUrl = '';
  let other: TestBrowser;
  let otherPage: Page;

  beforeAll(async () => {
    await ensureClientBuilt();
    server = await startTestServer();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    await signUp(page, server.url);
  }, 180_000);

  afterAll(async () => {
    await other?.close();
    await browser?.close();
    await server?.close();
  });

  it('when a new shop opens its library, then it is empty and offers a new pattern', async () => {
    await page.getByRole('heading', { name: 'Pattern library' }).waitFor();
    await page.getByText('The library is empty.').waitFor();
    await snap(page, 'library-01-empty');
  });

  it('when the owner creates a collar from its preset, then the editor opens on revision 1 with a drawn preview', async () => {
    await page.getByRole('link', { name: 'New pattern' }).click();
    await page.getByRole('heading', { name: 'New pattern' }).waitFor();
    await page.getByLabel('Collar').check();
    await page.getByLabel('Pattern name').fill('Collar for Juniper');
    await page.getByLabel('Tags').fill('dogs, bridle');
    await snap(page, 'library-02-new-pattern');
    await page.getByRole('button', { name: 'Create pattern' }).click();
    await page.getByRole('heading', { name: 'Collar for Juniper' }).waitFor();
    await page.getByTestId('drawing-preview').locator('svg').waitFor();
    patternUrl = page.url();
    await expect(page.getByTestId('head-revision').textContent()).resolves.toContain('Revision 1');
    // Collar preset (common practice): 13 in neck, blank = neck + 8 in = 21 in.
    expect(await blankText(page)).toBe('21 in');
    await snap(page, 'library-03-editor');
  });

  it('when the girth changes from 13 in to 15 in, then the preview redraws with a 2 in longer blank (blank = neck + 8 in, common practice)', async () => {
    const before = await page.getByTestId('drawing-preview').innerHTML();
    const girth = page.getByLabel(/^Girth \((in|mm)\)/);
    await girth.fill('15');
    await page.waitForFunction(() => document.querySelector('[data-testid="strap-blank"] strong')?.textContent === '23 in');
    const after = await page.getByTestId('drawing-preview').innerHTML();
    expect(after).not.toBe(before);
    await snap(page, 'library-04-girth-changed');
    await snapElement(page.getByTestId('drawing-preview'), 'library-04a-preview-whole');
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await snapElement(page.getByTestId('drawing-preview'), 'library-04b-preview-zoomed');
    await page.getByRole('button', { name: 'Whole strap' }).click();
  });

  it('when the owner saves with a note, then revision 2 is the head and the form is clean', async () => {
    await page.getByLabel('Note for this revision').fill('Juniper grew: neck now 15 in.');
    await page.getByRole('button', { name: 'Save revision 2' }).click();
    await page.getByText('Saved as revision 2.').waitFor();
    await expect(page.getByTestId('head-revision').textContent()).resolves.toContain('Revision 2');
    await snap(page, 'library-05-saved');
  });

  it('when lengths are shown in millimetres, then the 15 in girth reads 381 (1 in = 25.4 mm, 1959 agreement) and the labels say mm', async () => {
    await page.getByLabel('Show lengths in').selectOption('mm');
    await expect.poll(() => page.getByLabel(/^Girth \((in|mm)\)/).inputValue()).toBe('381');
    // Every length field names its unit in its label (and so in its accessible name).
    await page.getByLabel('Girth (mm)', { exact: true }).waitFor();
    await expect.poll(() => blankText(page)).toBe('584.2 mm');
    await snap(page, 'library-05c-millimetres');
    await page.getByLabel('Show lengths in').selectOption('in');
    await expect.poll(() => page.getByLabel(/^Girth \((in|mm)\)/).inputValue()).toBe('15');
  });

  it('when the length comes from fit instead of the rule, then the middle hole closes on girth + ease within 1/32 in', async () => {
    await page.getByLabel('Length from').selectOption('fit');
    const table = page.getByTestId('fit-table');
    const middle = table.locator('tr[aria-current="true"]');
    // Fit mode puts the middle hole at the target inside length (TRADE.md: the buckle lands on the middle hole).
    await expect.poll(async () => (await middle.locator('td').nth(3).textContent())?.trim()).toBe('±0');
    // Five holes, counted from 1 at the buckle: the middle one is hole 3, and the table says so in words.
    await expect(middle.locator('th').textContent()).resolves.toBe('3middle hole');
    // Girth 15 in + ease 0: the middle hole's inside length is the girth itself.
    await expect(middle.locator('td').nth(2).textContent()).resolves.toBe('15 in');
    await table.getByRole('columnheader', { name: 'Inside vs girth + ease' }).waitFor();
    await page.getByTestId('rule-vs-fit').getByText('Fit (in use)').waitFor();
    await snap(page, 'library-05d-fit-mode');
    await page.getByLabel('Length from').selectOption('rule');
    await expect.poll(() => blankText(page)).toBe('23 in');
  });

  it('when the girth is not a length or is below the limit, then the field and the preview name it by its label in inches and saving waits', async () => {
    const girth = page.getByLabel(/^Girth \((in|mm)\)/);
    const problems = page.getByTestId('draft-problems');
    await girth.fill('thirteen');
    // The form shows inches, so the message asks for inches, beside the field and in the preview alike.
    await page.getByText('Girth must be a length in inches', { exact: true }).first().waitFor();
    await problems.getByText('Girth must be a length in inches', { exact: true }).waitFor();
    await expect(girth.getAttribute('aria-invalid')).resolves.toBe('true');
    expect(await page.getByRole('button', { name: 'Save revision 3' }).isDisabled()).toBe(true);
    // The schema's own limit, quoted from shared/schemas/strap-spec-limits.ts (GIRTH_MIN_MM = 50),
    // in inches rounded up to the next 1/32: 50 / 25.4 = 1.9685 -> 1 31/32 in (1 in = 25.4 mm, 1959 agreement).
    await girth.fill('1');
    await problems.getByText('Girth must be at least 1 31/32 in', { exact: true }).waitFor();
    expect(await page.getByText('Girth must be at least 1 31/32 in', { exact: true }).count()).toBe(2);
    // No schema path or millimetre limit reaches the screen while the person works in inches.
    expect(await problems.textContent()).not.toMatch(/girthMm|50 mm/);
    await snap(page, 'library-05e-girth-refused');
    await girth.fill('15');
    await expect.poll(() => blankText(page)).toBe('23 in');
  });

  it('when the built-in preset is loaded over an edited form, then it asks first, the form is back at 13 in and leaving asks first', async () => {
    await page.getByLabel(/^Girth \((in|mm)\)/).fill('16');
    await expect.poll(() => blankText(page)).toBe('24 in');
    const startAgain = page.getByTestId('start-values');
    await startAgain.getByText('Start again from:').waitFor();
    await startAgain.getByRole('button', { name: 'Built-in preset' }).click();
    await page.getByRole('alertdialog', { name: "Replace the form's values?" }).waitFor();
    await page.getByRole('button', { name: 'Replace the values' }).click();
    await expect.poll(() => page.getByLabel(/^Girth \((in|mm)\)/).inputValue()).toBe('13');
    await expect.poll(() => blankText(page)).toBe('21 in');
    await page.getByRole('link', { name: 'Library' }).click();
    await page.getByRole('alertdialog', { name: 'Leave without saving?' }).waitFor();
    await snap(page, 'library-05b-leave-guard');
    await page.getByRole('button', { name: 'Stay and save' }).click();
    expect(page.url()).toBe(patternUrl);
  });

  it('when the library is searched by name and filtered by kind, then the collar is listed', async () => {
    await page.getByRole('link', { name: 'Library' }).click();
    await page.getByRole('button', { name: 'Leave' }).click();
    await page.getByTestId('pattern-list').waitFor();
    await page.getByLabel('Search names').fill('Juniper');
    await page.waitForURL(/query=Juniper/);
    await page.getByLabel('Kind').selectOption('collar');
    await page.waitForURL(/kind=collar/);
    await expect(page.getByTestId('pattern-list').getByRole('link').allTextContents()).resolves.toEqual(['Collar for Juniper']);
    await snap(page, 'library-06-list');
    await page.getByLabel('Kind').selectOption('belt');
    await page.getByText('No pattern matches these filters.').waitFor();
    expect(patternUrl).toMatch(/\/patterns\/\d+$/);
  });

  it('when the owner invites an apprentice, then the invite is listed and its e-mail reaches the fake mailbox with a link', async () => {
    await page.getByRole('link', { name: 'Shop' }).click();
    await page.getByRole('heading', { name: 'People in the shop' }).waitFor();
    await page.getByLabel('E-mail to invite').fill(apprentice.email);
    await page.getByLabel('Role', { exact: true }).selectOption('apprentice');
    await page.getByRole('button', { name: 'Send invite' }).click();
    await page.getByText(`Invite sent to ${apprentice.email} as apprentice.`).waitFor();
    await page.getByTestId('open-invites').getByText(apprentice.email).waitFor();
    await snap(page, 'library-07-shop-invite');

    // The outbox sends after the commit: reload the server's mailbox page until it arrives
    // (the bound only guards against a hang; a busy machine may take seconds).
    await page.getByRole('link', { name: /Mailbox/ }).click();
    const link = page.locator('a[href*="/invite/"]').first();
    await expect
      .poll(
        async () => {
          if ((await link.count()) === 0) await page.reload();
          return link.count();
        },
        { timeout: 60_000, interval: 250 },
      )
      .toBeGreaterThan(0);
    inviteUrl = (await link.getAttribute('href')) ?? '';
    expect(inviteUrl.startsWith(server.url + '/invite/')).toBe(true);
    await snap(page, 'library-08-dev-mailbox');
  });

  it('when the apprentice opens the link in their own browser and joins, then their shell shows the shop and the role Apprentice', async () => {
    other = await launchBrowser();
    otherPage = await other.context.newPage();
    const p = otherPage;
    await p.goto(inviteUrl);
    await p.getByRole('heading', { name: `Join ${owner.shopName}` }).waitFor();
    await snap(p, 'library-09-invite');
    await p.getByLabel('Your name').fill(apprentice.name);
    await p.getByLabel('Choose a password').fill(apprentice.password);
    await p.getByRole('button', { name: `Join ${owner.shopName}` }).click();
    await p.getByRole('heading', { name: 'Pattern library' }).waitFor();
    await expect(p.getByTestId('role').textContent()).resolves.toBe('Apprentice');
    await expect(p.getByTestId('shop-name').textContent()).resolves.toBe(owner.shopName);
    // Apprentices read the library but cannot start patterns (permission table).
    expect(await p.getByRole('link', { name: 'New pattern' }).count()).toBe(0);
    await snap(p, 'library-10-apprentice-library');
  });

  it('when the apprentice opens the collar, then the bench and Print come first, the values are folded away and read-only, and there is no save', async () => {
    const p = otherPage;
    await p.getByRole('link', { name: 'Collar for Juniper' }).click();
    await p.getByTestId('drawing-preview').locator('svg').waitFor();
    // The saved head (15 in neck) is what the apprentice sees: blank = 15 + 8 = 23 in (common practice).
    expect(await blankText(p)).toBe('23 in');
    await p.getByTestId('bench-state').getByText('Your role can read and print this pattern.').waitFor();
    const print = p.getByTestId('bench-print');
    await p.getByRole('link', { name: 'Template PDF' }).waitFor();
    // The values are folded away below the bench, not open as a form.
    const fold = p.getByTestId('read-only-values');
    expect(await fold.getAttribute('open')).toBeNull();
    expect(await p.getByLabel(/^Girth \((in|mm)\)/).isVisible()).toBe(false);
    const [printBox, foldBox] = await Promise.all([print.boundingBox(), fold.boundingBox()]);
    expect(printBox!.y).toBeLessThan(foldBox!.y);
    // Nothing offers to change or reload the values.
    expect(await p.getByRole('button', { name: /Save revision/ }).count()).toBe(0);
    expect(await p.getByTestId('start-values').count()).toBe(0);
    await snap(p, 'library-11-apprentice-read-only');
    // Unfolded, every spec field reads the saved values and none can be changed.
    await fold.getByText('All values of revision 2').click();
    const girth = p.getByLabel(/^Girth \((in|mm)\)/);
    await girth.waitFor();
    expect(await girth.inputValue()).toBe('15');
    expect(await girth.isDisabled()).toBe(true);
    expect(await p.getByLabel('Strap width').isDisabled()).toBe(true);
    await snap(p, 'library-11b-apprentice-values-unfolded');
  });

  it('when the apprentice tries to save through the API anyway, then the server refuses with 403', async () => {
    const p = otherPage;
    const status = await p.evaluate(async (path) => {
      const res = await fetch(path + '/revisions', { method: 'POST', headers: { 'Content-Type': 'application/json', 'If-Match': '"x"' }, body: JSON.stringify({ spec: {}, note: '' }) });
      return res.status;
    }, '/api' + new URL(patternUrl).pathname);
    expect(status).toBe(403);
  });

  it('when the owner makes the apprentice a maker, then after a reload the apprentice can edit the spec', async () => {
    await page.goto(server.url + '/shop/members');
    await page.getByLabel(`Role of ${apprentice.name}`).selectOption('maker');
    await expect.poll(() => page.getByLabel(`Role of ${apprentice.name}`).inputValue()).toBe('maker');
    await otherPage.reload();
    await otherPage.getByTestId('drawing-preview').locator('svg').waitFor();
    // A maker gets the open form: no fold, the girth shown and editable, and a save.
    await expect.poll(() => otherPage.getByLabel(/^Girth \((in|mm)\)/).isEnabled()).toBe(true);
    expect(await otherPage.getByLabel(/^Girth \((in|mm)\)/).isVisible()).toBe(true);
    expect(await otherPage.getByTestId('read-only-values').count()).toBe(0);
    await otherPage.getByRole('button', { name: /Save revision/ }).waitFor();
  });

  it('when the only owner tries to step down, then the server refuses and the table says why', async () => {
    await page.getByLabel(`Role of ${owner.name}`).selectOption('maker');
    await page.getByText('A shop needs at least one owner').waitFor();
    await expect.poll(() => page.getByLabel(`Role of ${owner.name}`).inputValue()).toBe('owner');
    await snap(page, 'library-12-last-owner');
  });
});
