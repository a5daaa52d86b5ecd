// The fake SMTP server's read-only inbox (scripts/fakes/smtp.mjs), for the browser tests that follow a mail.
import assert from 'node:assert/strict';

/** Every captured mail as JSON, newest first. scripts/test.sh names the inbox's web port in SMTP_WEB_PORT. */
export async function mails() {
  const port = process.env.SMTP_WEB_PORT;
  assert.ok(port, 'SMTP_WEB_PORT names the fake SMTP inbox (scripts/test.sh sets it)');
  const response = await fetch(`http://127.0.0.1:${port}/messages.json`);
  assert.equal(response.status, 200);
  return response.json();
}

/** Waits (up to 30 s) for a captured mail that holds the text (a site's name, a recipient's address). */
export async function waitForMail(page, text) {
  for (let attempt = 0; attempt < 150; attempt += 1) {
    const found = (await mails()).find((m) => JSON.stringify(m).includes(text));
    if (found) return found;
    await page.waitForTimeout(200);
  }
  throw new Error(`No mail about ${text} reached the fake SMTP inbox in 30 s`);
}
