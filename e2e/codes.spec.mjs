// Browser spec: a technician types a code as read off a scan tool, sees it corrected and
// decoded, opens the code page, chooses the vehicle and sees the fix path as stepping stones.
export const name = 'codes: code entry, code page and fix path';

export default async function codes({ page, baseUrl, shot }) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill('technician@causeway.test');
  await page.getByLabel('Password').fill('demo-pass-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${baseUrl}/`);

  await page.goto(`${baseUrl}/codes`);
  const entry = page.getByRole('searchbox', { name: 'Look up a fault code' });
  await entry.fill('po456');
  const decoded = page.getByTestId('code-entry-decoded');
  await decoded.getByText('Corrected: letter O read as digit 0 at position 2').waitFor();
  // The catalogue's title, from the index the page fetched once.
  await decoded.getByText('Evaporative Emission System Leak Detected (very small leak)').waitFor();
  await decoded.getByText('Powertrain (P)').waitFor();

  // The instant search beside it.
  await page.getByRole('searchbox', { name: 'Search by what it says' }).fill('very small leak');
  await page.getByRole('list', { name: 'Search results' }).getByRole('link', { name: /P0456/ }).waitFor();
  await page.getByRole('table').getByRole('link', { name: 'P0100' }).waitFor();
  await shot('codes-entry');

  await entry.press('Enter');
  await page.waitForURL(/\/codes\/P0456$/);
  await page.getByRole('heading', { level: 1, name: /^P0456 · Evaporative Emission System Leak Detected/ }).waitFor();

  await page.getByRole('combobox', { name: 'Make', exact: true }).click();
  await page.locator('.ant-select-item-option[title="Halden"]').click();
  await page.waitForURL(/make=Halden/);
  await page.getByRole('combobox', { name: 'Model', exact: true }).click();
  await page.locator('.ant-select-item-option[title="Tarn"]').click();
  await page.waitForURL(/make=Halden&model=Tarn/);

  const stones = page.getByRole('list', { name: 'Stages of the fix path' });
  // The Tarn's own list: its vent valve sits on the fuel tank, so a stage opens the tank.
  await stones.getByText(/Opens: Lower and refit the fuel tank/).waitFor();
  const count = await stones.getByRole('listitem').count();
  if (count < 2) throw new Error(`expected at least two stages on the fix path, got ${count}`);
  await page.getByTestId('expected-cost').waitFor();
  await page.getByRole('region', { name: 'Possible causes' }).getByText('EVAP canister vent valve').first().waitFor();
  await page.locator('.recharts-surface').nth(1).waitFor();

  // What-if: a cheaper labour rate re-plans in the browser.
  const before = await page.getByTestId('expected-cost').textContent();
  const rate = page.getByRole('spinbutton', { name: 'Labour rate per hour, before tax (GBP)' });
  await rate.fill('60');
  await page.getByText('With your figures', { exact: true }).waitFor();
  const after = await page.getByTestId('expected-cost').textContent();
  if (after === before) throw new Error(`the expected cost did not change with the labour rate (${before})`);
  await page.getByRole('button', { name: /Reset to the shop's figures/ }).click();
  await page.getByTestId('expected-cost').getByText(before ?? '').waitFor();

  // A full-page shot from the top, so the sticky header is not drawn over the middle of it.
  await page.evaluate(() => window.scrollTo(0, 0));
  await shot('fix-path');
}
