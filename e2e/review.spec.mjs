// Issue "Field reports and the review desk": a contributor files a confirmed fix with a
// photo and submits it; a moderator approves it on the review desk.
export const name = 'field report with a photo, approved on the review desk';

import { deflateSync } from 'node:zlib';

function crc32(buf) {
  let c = ~0;
  for (const byte of buf) {
    c ^= byte;
    for (let k = 0; k < 8; k += 1) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
  }
  return ~c >>> 0;
}

function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** A small solid-colour PNG, made here (the server re-encodes photos, so any valid image will do). */
function png(width, height, [r, g, b]) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // truecolour
  const row = Buffer.concat([Buffer.from([0]), Buffer.from(Array.from({ length: width }, () => [r, g, b]).flat())]);
  const pixels = Buffer.concat(Array.from({ length: height }, () => row));
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', header), chunk('IDAT', deflateSync(pixels)), chunk('IEND', Buffer.alloc(0))]);
}

const PNG = png(32, 24, [15, 94, 99]);

async function signIn(page, baseUrl, account) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(`${account}@causeway.test`);
  await page.getByLabel('Password').fill('demo-pass-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
  await page.getByRole('button', { name: /sign out/i }).waitFor();
}

export default async function ({ page, baseUrl, shot }) {
  // A vehicle year no demo report uses, so this report is told apart on the desk.
  const year = String(2010 + (Date.now() % 8));
  const title = `P0303 fixed by Ignition coil (one cylinder) on Morrow Strand 3.0 V6 ${year}`;

  await signIn(page, baseUrl, 'contributor');
  await page.getByRole('navigation').first().getByText('Field reports').click();
  await page.getByRole('button', { name: 'New field report' }).click();
  await page.getByRole('heading', { name: 'New field report' }).waitFor();

  // Lower case on purpose: the codec's reading is shown.
  await page.getByLabel('Fault code').fill('p0303');
  await page.getByTestId('code-reading').getByText('Read as').waitFor();
  await page.getByLabel('Make').fill('Morrow');
  await page.getByLabel('Model', { exact: true }).fill('Strand');
  await page.getByLabel('Engine (optional)').fill('3.0 V6');
  await page.getByLabel('Model year (optional)').fill(year);
  await page.getByLabel(/^Odometer/).fill('91200');
  await page.getByLabel('The part that fixed it').click();
  await page.keyboard.type('Ignition coil (one');
  await page.locator('.ant-select-item-option').filter({ hasText: 'Ignition coil (one cylinder)' }).click();
  await page.getByLabel('Notes (optional)').fill('Swapped coils 3 and 5; the misfire followed the coil. New coil, code stayed away after two drive cycles.');
  await page.locator('input[type=file]').setInputFiles({ name: 'coil-cylinder-3.png', mimeType: 'image/png', buffer: PNG });
  await page.getByText('coil-cylinder-3.png').waitFor();
  await page.getByRole('button', { name: 'Submit for review' }).click();

  // Back on the list, waiting for review.
  await page.waitForURL(/\/reports$/);
  const row = page.getByRole('row').filter({ hasText: title });
  await row.getByText('Waiting for review').waitFor();
  await row.getByText('1 file').waitFor();

  // Sign out; the moderator decides it.
  await page.getByRole('button', { name: /sign out/i }).click();
  await page.waitForURL(/\/sign-in/);
  await signIn(page, baseUrl, 'moderator');
  await page.getByRole('navigation').first().getByText('Review desk').click();
  await page.getByRole('link', { name: title }).click();
  await page.getByText('What approving changes').waitFor();
  await page.getByText('Likelihoods before and after').waitFor();
  await page.getByRole('img', { name: /coil-cylinder-3/ }).waitFor();
  await shot('review-desk');

  await page.getByLabel('Note to the contributor (optional)').fill('Thanks: the swap test is convincing.');
  await page.getByRole('button', { name: 'Approve report' }).click();
  await page.getByText(/Report approved/).waitFor();
  await page.waitForURL(/\/review$/);
  // The queue refetches after the decision: the report leaves it.
  await page
    .getByRole('link', { name: title })
    .waitFor({ state: 'detached', timeout: 15_000 })
    .catch(() => {
      throw new Error('the approved report is still in the queue');
    });

  // It shows among the approved ones.
  await page.getByLabel('Status').click();
  await page.locator('.ant-select-item-option').filter({ hasText: 'Approved' }).click();
  await page.getByRole('link', { name: title }).waitFor();
}
