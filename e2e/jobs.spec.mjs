// Issue 5 (jobs, fix path, staged estimate): a technician opens the open demo job (the Halden
// Tarn EVAP job at Kestrel Lane Garage), records a step and sees the fix path change; then
// prepares and sends the staged estimate, which arrives at the local mail catcher; the owner
// opens the link from the e-mail (no account) and approves a stage; the job shows the answer.
export const name = 'job: record a step, fix path updates; staged estimate e-mailed, owner approves a stage';

const OWNER_EMAIL = 'priya.anand@example.com';
const LINK = /https?:\/\/[^\s"'<>]+\/estimate\/[A-Za-z0-9_-]{43}/;

async function stageTexts(page) {
  return page.getByTestId('fix-path-P0456').getByTestId('fix-path-stage').allInnerTexts();
}

async function waitForMail(mailUrl, address, timeoutMs = 15_000) {
  const until = Date.now() + timeoutMs;
  for (;;) {
    // MailDev's REST API (as backend/test/utils/mail-catcher.ts reads it): GET /api/email.
    const res = await fetch(`${mailUrl}/api/email`);
    if (res.ok) {
      const messages = await res.json();
      const found = messages.filter((m) => m.to.some((t) => t.address.toLowerCase() === address)).at(-1);
      if (found) return found;
    }
    if (Date.now() > until) throw new Error(`no mail to ${address} arrived at ${mailUrl}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

export default async function ({ page, baseUrl, shot, mailUrl }) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill('technician@causeway.test');
  await page.getByLabel('Password').fill('demo-pass-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: /^Welcome, / }).waitFor();

  // The open EVAP job on the Halden Tarn, found through the job list's filters.
  await page.goto(`${baseUrl}/jobs?status=open&code=P0456`);
  const row = page.getByRole('row').filter({ hasText: 'KX19 HTN' }).filter({ hasText: 'P0456' });
  await row.getByRole('link', { name: /Halden Tarn/ }).click();
  await page.waitForURL(/\/jobs\/[0-9a-f-]{36}$/);
  const jobUrl = page.url();
  await page.getByRole('heading', { level: 1, name: /Halden Tarn 1\.6 T · KX19 HTN/ }).waitFor();
  await page.getByTestId('fix-path-P0456').waitFor();

  const before = await stageTexts(page);
  if (!before.some((t) => t.includes('EVAP purge valve'))) throw new Error(`expected the purge valve on the fix path, got ${JSON.stringify(before)}`);

  // Record a step: the purge valve checked, not at fault, at the planned cost.
  await page.getByRole('combobox', { name: /Part checked/ }).click();
  await page.getByTitle('EVAP purge valve', { exact: true }).click();
  await page.getByRole('radio', { name: 'Not at fault' }).check();
  const cost = page.getByRole('spinbutton', { name: /Actual cost before tax/ });
  if (!(await cost.inputValue())) await cost.fill('28.50');
  await page.getByRole('textbox', { name: /Notes/ }).fill('Purge valve holds vacuum with the engine off.');
  await page.getByRole('button', { name: 'Record the step' }).click();
  await page.getByText('Step recorded; the fix path is updated').waitFor();

  // The fix path is recomputed without the part ruled out; the timeline has the step.
  await page.waitForFunction(
    () => {
      const path = document.querySelector('[data-testid="fix-path-P0456"]');
      return path && !path.textContent.includes('EVAP purge valve');
    },
    null,
    { timeout: 15_000 },
  );
  const after = await stageTexts(page);
  if (after.join('|') === before.join('|')) throw new Error('the fix path did not change after the step');
  await page.getByRole('list', { name: 'Timeline of steps' }).getByText('Checked EVAP purge valve: not at fault').waitFor();
  await page.getByText(/Ruled out in this job: .*EVAP purge valve/).waitFor();
  await page.evaluate(() => window.scrollTo(0, 0));
  await shot('job-fix-path');

  // Prepare the staged estimate and send it to the owner.
  await page.getByRole('button', { name: 'Prepare estimate' }).click();
  const drawer = page.getByRole('dialog', { name: 'Prepare a staged estimate' });
  await drawer.getByTestId('estimate-stage').first().waitFor();
  const gross = await drawer.getByTestId('price-gross').first().innerText();
  if (!/£\d/.test(gross)) throw new Error(`expected a price with tax in pounds, got ${gross}`);
  await drawer.getByRole('button', { name: /Send to owner/ }).click();
  await drawer.getByText(`E-mailed to ${OWNER_EMAIL}`).waitFor({ timeout: 20_000 });
  const shownLink = await drawer.getByTestId('estimate-link').getAttribute('href');

  // The e-mail arrived at the catcher and carries the same link.
  const mail = await waitForMail(mailUrl, OWNER_EMAIL);
  const mailed = LINK.exec(`${mail.text ?? ''} ${mail.html ?? ''}`)?.[0];
  if (!mailed) throw new Error(`no estimate link in the e-mail "${mail.subject}"`);
  if (shownLink && new URL(shownLink).pathname !== new URL(mailed).pathname) throw new Error('the e-mailed link differs from the one shown on the job');

  // The owner opens it (no account) and approves the first stage.
  const publicPath = new URL(mailed.replace(/&amp;/g, '&')).pathname;
  await page.goto(`${baseUrl}${publicPath}`);
  await page.getByRole('heading', { level: 1, name: /Staged estimate for your 2019 Halden Tarn/ }).waitFor();
  if ((await page.getByRole('navigation', { name: 'Main' }).count()) > 0) throw new Error('the public estimate shows the signed-in navigation');
  await page.getByLabel(/Your name/).fill('Priya Anand');
  await page.getByRole('button', { name: 'Approve stage 1' }).click();
  await page.getByTestId('stage-decision').first().getByText(/Approved by Priya Anand/).waitFor();
  await page.evaluate(() => window.scrollTo(0, 0));
  await shot('public-estimate');

  // Back on the job, the answer shows with when it came.
  await page.goto(jobUrl);
  await page.getByTestId('sent-estimate').first().getByTestId('owner-answer').first().getByText(/Approved/).waitFor();
}
