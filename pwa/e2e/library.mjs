// Browser end-to-end tests of the structure check and the compound library against a running server.
// Registered in run.mjs; the same launch and sign-in helpers as the shell tests.
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { openTab, signInTo, signOut, waitForPage, waitForServiceWorker } from './shell.mjs';

// Ammonia near its experimental shape (pyramidal, N–H about 1 Å): C3v, Γvib = 2A1 + 2E.
const AMMONIA = ['4', 'ammonia', 'N 0 0 0.1', 'H 0.94 0 -0.27', 'H -0.47 0.814 -0.27', 'H -0.47 -0.814 -0.27'].join('\n');
// The same file with a coordinate that is not a number on line 5.
const BROKEN = AMMONIA.replace('H -0.47 0.814 -0.27', 'H -0.47 north -0.27');

/** A CAS RN no library compound carries, with its check digit worked out by CAS's published rule (from memory). */
function unusedCas() {
  const body = String(1_000_000 + (Date.now() % 8_000_000));
  const digits = body.slice(0, 5) + body.slice(5, 7);
  let sum = 0;
  for (let i = 0; i < digits.length; i++) sum += Number(digits[digits.length - 1 - i]) * (i + 1);
  return `${body.slice(0, 5)}-${body.slice(5, 7)}-${sum % 10}`;
}

/** Picks a source from the library's list in the source field with the given test id, and how it is known. */
async function chooseSource(scope, testId, citation, basis) {
  const field = scope.getByTestId(testId).last();
  await field.getByLabel('Source', { exact: true }).selectOption({ label: citation });
  await field.getByLabel('How the value is known').selectOption({ label: basis });
}

const DEMO_SOURCE = 'Invented demo data (not measured)';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

/** Pastes a structure into the structure check and runs it. */
async function runStructure(page, text) {
  await page.getByLabel('Structure text (XYZ or MOL)').last().fill(text);
  await page.getByRole('button', { name: 'Run the structure check' }).last().click();
}

/** Waits for the point group the structure check shows and returns the numbers beside it. */
async function readStructureResult(page, group) {
  const result = page.getByTestId('structure-point-group').last();
  await page.waitForFunction(
    (expected) => [...document.querySelectorAll('[data-testid="structure-point-group"]')].some((n) => n.textContent.trim() === expected),
    group,
    { timeout: 20_000 },
  );
  const text = async (id) => (await page.getByTestId(id).last().textContent()).trim();
  return {
    group: (await result.textContent()).trim(),
    gamma: await text('structure-gamma-vib'),
    ir: await text('count-ir'),
    raman: await text('count-raman'),
  };
}

/** Registers the structure check and compound library tests against the server at baseUrl. */
export function libraryTests({ baseUrl: BASE_URL, password: PASSWORD }) {
  describe('structure check and compound library', { concurrency: false }, () => {
    let browser;
    before(async () => {
      browser = await openBrowser({ origin: BASE_URL });
    });
    after(async () => {
      await browser?.close();
    });

    it('checks ammonia in the browser: C3v, 2A1 + 2E, 4 IR and 4 Raman active', async () => {
      const { page } = browser;
      await signInTo(page, BASE_URL, 'supervisor@demo.test', PASSWORD, 'Review queue');
      await openTab(page, 'Compound library');
      await page.getByText('Open the structure check').click();
      await waitForPage(page, 'Structure check');
      await runStructure(page, AMMONIA);
      const result = await readStructureResult(page, 'C3v');
      assert.equal(result.gamma, '2A1 + 2E');
      assert.match(result.ir, /^4\s*IR active$/);
      assert.match(result.raman, /^4\s*Raman active$/);
      const characterRows = await page.getByTestId('character-table').last().locator('tbody tr').count();
      assert.equal(characterRows, 3, 'C3v has three irreps: A1, A2, E');
      await assertAccessible(page, 'the structure check with a result');
      await screenshot(page, 'supervisor-structure-check-ammonia');
    });

    it('names the line of a malformed XYZ file in an alert', async () => {
      const { page } = browser;
      await runStructure(page, BROKEN);
      const alert = page.getByTestId('structure-error').last();
      await alert.waitFor();
      assert.equal(await alert.getAttribute('role'), 'alert');
      assert.match(await alert.textContent(), /line 5/);
      await assertAccessible(page, 'the structure check with an error');
      await screenshot(page, 'supervisor-structure-check-error');
    });

    it('runs the structure check again without a network', async () => {
      const { page, context } = browser;
      await waitForServiceWorker(page);
      await context.setOffline(true);
      try {
        await page.reload();
        await waitForPage(page, 'Structure check');
        assert.equal((await page.getByTestId('connection-status').last().textContent()).trim(), 'Offline');
        await runStructure(page, AMMONIA);
        const result = await readStructureResult(page, 'C3v');
        assert.equal(result.gamma, '2A1 + 2E');
        await screenshot(page, 'offline-structure-check');
      } finally {
        await context.setOffline(false);
      }
    });

    it('finds chlorine and shows its pictograms, H-statements and caution card', async () => {
      const { page } = browser;
      await page.goto(`${BASE_URL}/tabs/library`);
      await waitForPage(page, 'Compound library');
      await page.getByTestId('library-version').last().filter({ hasText: 'from the server' }).waitFor();
      await page.getByLabel('Search by name, synonym, CAS RN or formula').last().fill('chlorine');
      await page.getByTestId('compound-chlorine').last().waitFor();
      await assertAccessible(page, 'the compound library');
      await screenshot(page, 'supervisor-library-search');
      await page.getByTestId('compound-chlorine').last().click();
      await waitForPage(page, 'Chlorine');
      const card = page.getByTestId('compound-caution-card').last();
      const pictograms = card.locator('.sb-pictogram');
      assert.equal(await pictograms.count(), 4, 'chlorine carries GHS03, GHS04, GHS06 and GHS09');
      assert.ok(await pictograms.filter({ hasText: 'GHS06' }).isVisible());
      const cardText = await card.textContent();
      assert.match(cardText, /H330/, 'the H-statements are listed');
      assert.match(cardText, /Danger/, 'the signal word is shown');
      assert.match(await page.locator('.sb-caution').last().textContent(), /presumptive/);
      // The activity beside each fundamental comes from the structure check in the worker.
      await page.waitForFunction(() => {
        const cells = [...document.querySelectorAll('[data-testid^="activity-"]')];
        return cells.length > 0 && cells.every((c) => c.textContent.trim() !== 'checking…');
      }, undefined, { timeout: 20_000 });
      await assertAccessible(page, 'the chlorine detail page');
      await screenshot(page, 'supervisor-compound-chlorine');
    });

    it("lets a supervisor change chlorine's synonyms, and the change survives a reload", async () => {
      const { page } = browser;
      const synonym = `field code Cl-${Date.now() % 100000}`;
      await page.getByTestId('edit-compound').last().click();
      await waitForPage(page, 'Edit Chlorine');
      const box = page.getByLabel('Synonyms', { exact: true }).last();
      const before = await box.inputValue();
      await box.fill(`${before}\n${synonym}`);
      await page.getByTestId('labels-match').last().waitFor({ timeout: 20_000 });
      // Cl2 is D∞h: its one fundamental (Σg+) is Raman-active only, so no IR intensity can be given.
      assert.match(await page.getByTestId('inactive-ν1-ir').last().textContent(), /^IR-inactive in D/);
      assert.equal(await page.getByLabel('IR intensity of ν1').last().isDisabled(), true);
      assert.equal(await page.getByLabel('Raman intensity of ν1').last().isDisabled(), false);
      await assertAccessible(page, 'the compound editor');
      await screenshot(page, 'supervisor-compound-editor');
      await page.getByRole('button', { name: 'Save compound' }).last().click();
      await waitForPage(page, 'Chlorine');
      await page.getByTestId('compound-synonyms').last().filter({ hasText: synonym }).waitFor();
      await page.reload();
      await waitForPage(page, 'Chlorine');
      await page.getByTestId('compound-synonyms').last().filter({ hasText: synonym }).waitFor();

      // Offline, the library comes from the tablet's copy, supervisor's edit included.
      const { context } = browser;
      await waitForServiceWorker(page);
      await context.setOffline(true);
      try {
        await page.goto(`${BASE_URL}/tabs/library`);
        await waitForPage(page, 'Compound library');
        await page.getByTestId('library-version').last().filter({ hasText: "from this tablet's copy" }).waitFor();
        await page.getByLabel('Search by name, synonym, CAS RN or formula').last().fill(synonym);
        await page.getByTestId('compound-chlorine').last().waitFor();
        await screenshot(page, 'offline-library-from-tablet');
      } finally {
        await context.setOffline(false);
      }
    });

    it('refuses an entry the library cannot take, shows the server reasons, then adds and retires a copy', async () => {
      const { page } = browser;
      await page.goto(`${BASE_URL}/tabs/library/chlorine`);
      await waitForPage(page, 'Chlorine');
      await page.getByText('Copy as a new compound').last().click();
      await waitForPage(page, 'New compound');
      const id = `e2e-halogen-${Date.now() % 100000}`;
      await page.getByLabel('Id (lower-case letters, digits and hyphens)').last().fill(id);
      await page.getByLabel('Name', { exact: true }).last().fill('Trial halogen');

      // A CAS RN with a wrong check digit never leaves the tablet.
      await page.getByLabel('CAS RN').last().fill('7782-50-4');
      await page.getByTestId('entry-error').last().filter({ hasText: 'check digit' }).waitFor();
      assert.equal(await page.getByRole('button', { name: 'Save compound' }).last().isDisabled(), true);

      // Chlorine's own CAS RN passes on the tablet, but the server refuses a second compound with it.
      await page.getByLabel('CAS RN').last().fill('7782-50-5');
      await page.getByTestId('labels-match').last().waitFor({ timeout: 20_000 });
      await page.getByRole('button', { name: 'Save compound' }).last().click();
      await page.getByTestId('server-error').last().filter({ hasText: '7782-50-5' }).waitFor();
      await assertAccessible(page, 'the compound editor with server reasons');
      await screenshot(page, 'supervisor-compound-editor-refused');

      // 1234-56-6 has a valid check digit (6×1 + 5×2 + 4×3 + 3×4 + 2×5 + 1×6 = 56) and is not in the library.
      await page.getByLabel('CAS RN').last().fill('1234-56-6');
      await page.getByRole('button', { name: 'Save compound' }).last().click();
      await waitForPage(page, 'Trial halogen');
      await page.getByRole('button', { name: 'Retire compound' }).last().click();
      await page.getByRole('button', { name: 'Press again to retire it' }).last().click();
      await waitForPage(page, 'Compound library');
      await page.getByLabel('Search by name, synonym, CAS RN or formula').last().fill('Trial halogen');
      await page.getByText('No compound matches').last().waitFor();
      await signOut(page);
    });

    it('adds a compound from the blank form: two IR bands, a GHS class, sources from the list; a refusal lists its reasons', async () => {
      const { page } = browser;
      await signInTo(page, BASE_URL, 'supervisor@demo.test', PASSWORD, 'Review queue');
      await openTab(page, 'Compound library');
      await page.getByTestId('add-compound').last().click();
      await waitForPage(page, 'New compound');
      const name = `Demo degreaser ${Date.now() % 100000}`;
      const id = name.toLowerCase().replace(/ /g, '-');
      await page.getByLabel('Name', { exact: true }).last().fill(name);
      assert.equal(await page.getByLabel('Id (lower-case letters, digits and hyphens)').last().inputValue(), id, 'the id follows the name');
      await page.getByLabel('Formula', { exact: true }).last().fill('C4H8O2');
      await page.getByLabel('Family').last().selectOption({ label: 'Solvent or fuel' });

      // The CAS RN is checked as it is typed.
      const cas = page.getByLabel('CAS RN', { exact: true }).last();
      await cas.fill('7782-50-4');
      await page.getByTestId('cas-status').last().filter({ hasText: 'check digit does not match' }).waitFor();
      // Chlorine's CAS RN passes on the tablet; the server refuses a second compound with it.
      await cas.fill('7782-50-5');
      await page.getByTestId('cas-status').last().filter({ hasText: 'Check digit correct' }).waitFor();
      await chooseSource(page, 'cas-source', DEMO_SOURCE, 'invented (demo only)');

      await chooseSource(page, 'bands-source', DEMO_SOURCE, 'invented (demo only)');
      for (const [i, [cm1, intensity, assignment]] of [['1740', 'very strong', 'C=O stretch'], ['1240', 'strong', 'C–O stretch']].entries()) {
        await page.getByRole('button', { name: 'Add a band' }).last().click();
        const band = page.getByTestId(`band-${i}`).last();
        await band.getByLabel('Wavenumber, cm⁻¹').fill(cm1);
        await band.getByLabel('Relative intensity').selectOption({ label: intensity });
        await band.getByLabel('Assignment', { exact: true }).fill(assignment);
      }

      await page.getByRole('button', { name: 'Add a GHS classification' }).last().click();
      await page.getByLabel('Hazard class 1').last().selectOption({ label: 'Flammable liquid' });
      await page.getByLabel('Category of class 1').last().fill('2');
      await page.getByRole('button', { name: 'Add an H-statement' }).last().click();
      await page.getByLabel('H-statement 1').last().selectOption('H225');
      await page.getByLabel(/^GHS02 /).last().check();
      await page.getByLabel('Signal word').last().selectOption('Danger');
      await page.getByLabel('UN number').last().fill('1993');
      await chooseSource(page, 'hazard-source', DEMO_SOURCE, 'invented (demo only)');

      const preview = page.getByTestId('caution-preview').last();
      await preview.filter({ hasText: 'H225' }).waitFor();
      assert.equal(await preview.locator('.sb-pictogram').count(), 1, 'the preview shows the one pictogram chosen');
      assert.match(await preview.textContent(), /Danger/);
      await page.getByTestId('entry-error').last().waitFor({ state: 'detached' });
      await assertAccessible(page, 'the blank compound form, filled');
      await page.getByLabel('Name', { exact: true }).last().scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-new-compound-form');
      await page.getByTestId('band-1').last().scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-new-compound-bands');
      await preview.scrollIntoViewIfNeeded();
      await screenshot(page, 'supervisor-new-compound-preview');

      await page.getByRole('button', { name: 'Save compound' }).last().click();
      const refusal = page.getByTestId('server-error').last();
      await refusal.waitFor();
      const reasons = await refusal.getByTestId('server-reason').allTextContents();
      assert.equal(reasons.length, 1);
      assert.match(reasons[0], /CAS RN 7782-50-5 is also/);
      assert.doesNotMatch(reasons[0], /^The compound was not saved/, 'the reason itself, not the joined message');
      await assertAccessible(page, 'the blank compound form with the server reasons');
      await screenshot(page, 'supervisor-new-compound-refused');

      await cas.fill(unusedCas());
      await refusal.waitFor({ state: 'detached' });
      await page.getByRole('button', { name: 'Save compound' }).last().click();
      await waitForPage(page, name);
      const card = page.getByTestId('compound-caution-card').last();
      assert.match(await card.textContent(), /H225/);
      assert.ok(await card.locator('.sb-pictogram').filter({ hasText: 'GHS02' }).isVisible());
      const positions = await page.getByTestId('bands-table').last().locator('tbody tr td:nth-child(2)').allTextContents();
      assert.deepEqual(positions, ['1,740', '1,240']);
      await screenshot(page, 'supervisor-new-compound-detail');

      await page.goto(`${BASE_URL}/tabs/library`);
      await waitForPage(page, 'Compound library');
      await page.getByLabel('Search by name, synonym, CAS RN or formula').last().fill(name);
      await page.getByTestId(`compound-${id}`).last().waitFor();

      // A band's wavenumber changed in the editor is saved.
      await page.getByTestId(`compound-${id}`).last().click();
      await waitForPage(page, name);
      await page.getByTestId('edit-compound').last().click();
      await waitForPage(page, `Edit ${name}`);
      await page.getByTestId('band-0').last().getByLabel('Wavenumber, cm⁻¹').fill('1735.5');
      await assertAccessible(page, 'the compound editor of a band compound');
      await screenshot(page, 'supervisor-compound-editor-bands');
      await page.getByRole('button', { name: 'Save compound' }).last().click();
      await waitForPage(page, name);
      await page.getByTestId('bands-table').last().locator('tbody tr').first().filter({ hasText: '1,735.5' }).waitFor();
      await signOut(page);
    });

    it('shows the library read-only to an inspector, from the account tab', async () => {
      const { page } = browser;
      await signInTo(page, BASE_URL, 'inspector@demo.test', PASSWORD, 'Cases');
      await page.goto(`${BASE_URL}/tabs/account/library/chlorine`);
      await waitForPage(page, 'Chlorine');
      assert.equal(await page.getByTestId('edit-compound').count(), 0, 'no edit button for an inspector');
      assert.equal(await page.getByRole('button', { name: 'Retire compound' }).count(), 0);
      await assertAccessible(page, 'the chlorine detail page for an inspector');
      await screenshot(page, 'inspector-compound-chlorine');
      // Every role runs structure checks from the account tab; checked here in the dark palette too.
      await page.emulateMedia({ colorScheme: 'dark' });
      await page.goto(`${BASE_URL}/tabs/account/library/structure`);
      await waitForPage(page, 'Structure check');
      await runStructure(page, AMMONIA);
      assert.equal((await readStructureResult(page, 'C3v')).gamma, '2A1 + 2E');
      await assertAccessible(page, 'the structure check for an inspector, dark palette');
      await screenshot(page, 'inspector-structure-check-dark');
      await page.emulateMedia({ colorScheme: 'light' });
      // The supervisor's editor route is not in the inspector's shell at all.
      await page.goto(`${BASE_URL}/tabs/library/chlorine/edit`);
      await waitForPage(page, 'Cases');
      await signOut(page);
      assert.deepEqual(browser.foreignRequests, [], 'no request left the server');
      assert.deepEqual(browser.pageErrors, [], 'no script error');
    });
  });
}
