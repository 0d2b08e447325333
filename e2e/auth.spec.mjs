// Issue "Stand up Causeway": a newcomer registers a shop, signs out, signs in again and
// sees the home page; each demo role sees its own navigation.
export const name = 'register, sign in, home page, role navigation';

export default async function ({ page, baseUrl, shot }) {
  const email = `newcomer.${Date.now()}@example.test`;
  await page.goto(`${baseUrl}/register`);
  await page.getByLabel('Your name').fill('Pat Newcomer');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill('browser-pass-2026');
  await page.getByLabel('Repeat the password').fill('browser-pass-2026');
  await page.getByLabel('Shop name').fill('Heron Yard Motors');
  await page.getByLabel(/Labour rate/).fill('88.50');
  await page.getByLabel('Tax rate (%)').fill('20');
  await page.getByRole('button', { name: 'Create account and shop' }).click();
  await page.getByRole('heading', { name: 'Welcome, Pat Newcomer' }).waitFor();

  // Sign out, then sign in again.
  await page.getByRole('button', { name: /sign out/i }).click();
  await page.waitForURL(/\/sign-in/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('browser-pass-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Welcome, Pat Newcomer' }).waitFor();
  const nav = page.getByRole('navigation').first();
  await nav.getByText('Shop settings').waitFor();
  await shot('home-shop-owner');

  // Each demo role sees a different navigation.
  const seen = {};
  for (const account of ['technician', 'contributor', 'moderator', 'admin']) {
    await page.getByRole('button', { name: /sign out/i }).click();
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill(`${account}@causeway.test`);
    await page.getByLabel('Password').fill('demo-pass-2026');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: /^Welcome, / }).waitFor();
    seen[account] = (await page.getByRole('navigation').first().innerText()).split('\n').map((s) => s.trim()).filter(Boolean).join('|');
  }
  await shot('home-admin');
  const distinct = new Set(Object.values(seen));
  if (distinct.size !== 4) throw new Error(`expected four different navigations, got ${JSON.stringify(seen)}`);
  if (!seen.admin.includes('Users') || seen.technician.includes('Users')) throw new Error(`admin-only items leak: ${JSON.stringify(seen)}`);
  if (!seen.moderator.includes('Review desk') || seen.contributor.includes('Review desk')) throw new Error(`review desk visibility wrong: ${JSON.stringify(seen)}`);
}
