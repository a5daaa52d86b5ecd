// Browser end-to-end test of an invitation: the admin invites a person on the users page, the mail with
// the set-password link reaches the fake SMTP inbox, the link sets the password, the person signs in
// with the role they were given, and the used link is refused plainly. Registered in run.mjs.
import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { blockingViolations } from './axe.mjs';
import { openBrowser, screenshot } from './browser.mjs';
import { waitForMail } from './inbox.mjs';
import { openTab, signInTo, signOut, waitForPage } from './shell.mjs';

async function assertAccessible(page, where) {
  assert.deepEqual(await blockingViolations(page), [], `axe found serious or critical problems on ${where}`);
}

/** The set-password link of an invitation mail, and its token. */
function invitationLink(mail) {
  const match = /(https?:\/\/\S+\/set-password\?token=([A-Za-z0-9_-]+))/.exec(mail.text);
  assert.ok(match, `the invitation mail carries a set-password link, got: ${mail.text}`);
  return { link: match[1], token: match[2] };
}

export function inviteTests({ baseUrl, password }) {
  describe('inviting a person by e-mail', { concurrency: false }, () => {
    const stamp = Date.now() % 1000000;
    const email = `invited-${stamp}@demo.test`;
    const name = `Invited Reviewer ${stamp}`;
    const newPassword = `invited-${stamp}-password`;
    let admin;
    let invited;
    let token;
    before(async () => {
      admin = await openBrowser({ origin: baseUrl });
      // The invited person has their own browser: nobody is signed in there.
      invited = await openBrowser({ origin: baseUrl });
    });
    after(async () => {
      await admin?.close();
      await invited?.close();
    });

    it('invites a person from the users page, refuses a taken email plainly, and mails the link', async () => {
      const { page } = admin;
      await signInTo(page, baseUrl, 'admin@demo.test', password, 'Users');
      const form = page.getByTestId('invite-form');
      await form.waitFor();
      await form.getByRole('button', { name: 'Send invitation' }).click();
      await form.getByRole('alert').filter({ hasText: 'Fill in the name and the email address.' }).waitFor();

      await form.getByLabel('Name of the person to invite').fill(name);
      await form.getByRole('textbox', { name: 'Invitation email address' }).fill(email);
      await form.getByLabel('Role to give').selectOption('supervisor');
      await form.getByRole('button', { name: 'Send invitation' }).click();
      await form.getByRole('status').filter({ hasText: `Invitation sent to ${name} at ${email}.` }).waitFor();
      await page.getByTestId(`user-row-${email}`).waitFor();
      await assertAccessible(page, 'the users page with an invitation sent');
      await screenshot(page, 'admin-invite-sent');

      // The same address again: the API's 409 in words, with what to do instead.
      await form.getByLabel('Name of the person to invite').fill(name);
      await form.getByRole('textbox', { name: 'Invitation email address' }).fill(email);
      await form.getByRole('button', { name: 'Send invitation' }).click();
      await form.getByRole('alert').filter({ hasText: 'Someone already has an account with this email address.' }).waitFor();
      // A malformed address: the API's 400 reason is shown.
      await form.getByRole('textbox', { name: 'Invitation email address' }).fill('not-an-address');
      await form.getByRole('button', { name: 'Send invitation' }).click();
      await form.getByRole('alert').filter({ hasText: /Could not send the invitation: .*email/ }).waitFor();

      const mail = await waitForMail(page, email);
      assert.deepEqual(mail.to, [email]);
      ({ token } = invitationLink(mail));
      await signOut(page);
    });

    it('sets the password from the link, after the password rule and a mismatch are explained', async () => {
      const { page } = invited;
      await page.goto(`${baseUrl}/set-password?token=${token}`);
      await waitForPage(page, 'Choose your password');
      await assertAccessible(page, 'the set-password page');
      await screenshot(page, 'set-password');

      const submit = page.getByRole('button', { name: 'Set password' });
      await page.getByLabel('New password').fill('short');
      await page.getByLabel('The same password again').fill('short');
      await submit.click();
      await page.getByRole('alert').filter({ hasText: 'The password needs at least 12 characters.' }).waitFor();
      await page.getByLabel('New password').fill(newPassword);
      await page.getByLabel('The same password again').fill(`${newPassword}x`);
      // Each field shows its own text on demand, so a typing slip can be seen before sending.
      const repeatField = page.getByLabel('The same password again');
      const showRepeat = page.getByRole('button', { name: 'Show password' }).nth(1);
      await showRepeat.click();
      assert.equal(await repeatField.getAttribute('type'), 'text');
      assert.equal(await page.getByLabel('New password').getAttribute('type'), 'password', 'the other field stays hidden');
      assert.equal(await showRepeat.getAttribute('aria-pressed'), 'true');
      const box = await showRepeat.boundingBox();
      assert.ok(box && box.height >= 48 && box.width >= 48, 'the show button is a 48 px touch target');
      await assertAccessible(page, 'the set-password page with a password shown');
      await showRepeat.click();
      assert.equal(await repeatField.getAttribute('type'), 'password');
      await submit.click();
      await page.getByRole('alert').filter({ hasText: 'The two passwords differ.' }).waitFor();

      await page.getByLabel('The same password again').fill(newPassword);
      await submit.click();
      await page.waitForURL(/\/signin\?passwordSet=1$/);
      await page.getByRole('status').filter({ hasText: 'Your password is set.' }).waitFor();
    });

    it('signs the invited person in with the role they were given', async () => {
      const { page } = invited;
      await signInTo(page, baseUrl, email, newPassword, 'Review queue');
      await openTab(page, 'Account');
      assert.equal((await page.getByTestId('account-role').filter({ visible: true }).textContent()).trim(), 'Supervisor');
      await signOut(page);
    });

    it('refuses the used link with what to do next', async () => {
      const { page } = invited;
      await page.goto(`${baseUrl}/set-password?token=${token}`);
      await waitForPage(page, 'Choose your password');
      await page.getByLabel('New password').fill(`${newPassword}-again`);
      await page.getByLabel('The same password again').fill(`${newPassword}-again`);
      await page.getByRole('button', { name: 'Set password' }).click();
      const refused = page.getByTestId('set-password-refused').filter({ visible: true });
      await refused.waitFor();
      assert.match(await refused.textContent(), /has been used already, has expired.*ask your administrator to send you a new invitation/);
      await assertAccessible(page, 'the set-password page refusing a used link');
      await screenshot(page, 'set-password-used-link');

      // The old password still works: the refused link changed nothing.
      await signInTo(page, baseUrl, email, newPassword, 'Review queue');
    });
  });
}
