// Issue "Import scan-tool CSV exports": the technician uploads a semicolon-separated export
// with a byte-order mark, a lower-case code with a letter O, a hex code and a new vehicle's
// VIN; sees the preview with the corrections; commits it.
export const name = 'scan-tool CSV: preview with corrections, then commit';

const VIN_VALUES = Object.fromEntries([
  ...'0123456789'.split('').map((d) => [d, Number(d)]),
  ...Object.entries({ A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8, J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9, S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9 }),
]);
const VIN_WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];

/** A European-style VIN (starts with W) with a correct check digit (49 CFR 565.15), new on every run. */
function newVin() {
  const serial = String(Date.now() % 1_000_000).padStart(6, '0');
  const draft = `WCW${'ZZZ3C'}0N${'P'}${serial}`; // 3 + 5 + check + year (N) + plant (P) + serial = 17
  const sum = [...draft].reduce((s, ch, i) => s + VIN_VALUES[ch] * VIN_WEIGHTS[i], 0);
  const check = sum % 11 === 10 ? 'X' : String(sum % 11);
  return `${draft.slice(0, 8)}${check}${draft.slice(9)}`;
}

async function signIn(page, baseUrl, account) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(`${account}@causeway.test`);
  await page.getByLabel('Password').fill('demo-pass-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
  await page.getByRole('button', { name: /sign out/i }).waitFor();
}

export default async function ({ page, baseUrl, shot }) {
  const vin = newVin();
  if (vin.length !== 17) throw new Error(`bad test VIN ${vin}`);
  const csv =
    '\uFEFFDate;VIN;Odometer (km);Module;DTC;Status;Description;FF: RPM\r\n' +
    `2025-11-03 09:15;${vin};84211;ECM;po456;stored;EVAP system small leak;820\r\n` +
    `2025-11-03 09:15;${vin};84211;ECM;04 20;pending;Catalyst efficiency below threshold;790\r\n`;

  await signIn(page, baseUrl, 'technician');
  await page.getByRole('navigation').first().getByText('Imports').click();
  await page.getByRole('heading', { name: 'Imports' }).waitFor();
  await page.locator('input[type=file]').setInputFiles({ name: 'bay-2-scan.csv', mimeType: 'text/csv', buffer: Buffer.from(csv, 'utf8') });
  await page.getByRole('button', { name: 'Check the file' }).click();

  // Detected: semicolon, UTF-8 with BOM; the codes read as P0456 and P0420, corrections named.
  const columns = page.locator('.ant-card').filter({ has: page.getByText('Columns', { exact: true }) });
  await columns.getByText('Semicolon').waitFor();
  await columns.getByText('UTF-8 with byte-order mark').waitFor();
  const corrections = page.locator('.ant-card').filter({ has: page.getByText(/^Corrections \(\d+\)$/) });
  await corrections.getByText('po456').waitFor();
  await corrections.getByText('P0456').first().waitFor();
  await corrections.getByText('04 20').waitFor();
  await corrections.getByText('P0420').first().waitFor();
  const preview = page.locator('.ant-card').filter({ has: page.getByText(/^Preview: the first/) });
  await preview.getByText(vin).first().waitFor();
  await page.getByText('No problems: every row can be imported.').waitFor();
  await shot('import-preview');

  await page.getByRole('button', { name: 'Import the file' }).click();
  await page.getByText(/^Imported bay-2-scan\.csv: 1 job and 2 codes$/).waitFor({ timeout: 30_000 });

  // The history has it, and its report opens.
  const history = page.getByRole('row').filter({ hasText: 'bay-2-scan.csv' }).first();
  await history.getByText('Imported').waitFor();
  await page.getByRole('button', { name: 'Open the import report' }).click();
  await page.getByRole('heading', { name: 'Import report' }).waitFor();
  await page.getByText(vin).first().waitFor();
}
