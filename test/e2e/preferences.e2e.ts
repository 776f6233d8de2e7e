import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoColleagues, launchBrowser, signIn, type ListedUser, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;
let colleague: ListedUser;

beforeAll(async () => {
  browser = await launchBrowser();
  const technicians = await demoColleagues(browser, 'technician');
  expect(technicians.length).toBeGreaterThanOrEqual(2);
  colleague = technicians[0]!;
});

afterAll(async () => {
  await browser?.close();
});

describe('preferences', () => {
  it('keeps the pressure unit a person saved, after a reload', async () => {
    const page = await browser.newPage({ viewport: 'phone' });
    await signIn(page, colleague.email);
    await page.getByRole('heading', { level: 1, name: 'Technician home' }).waitFor();
    // The home's own way to the units.
    await page.getByRole('region', { name: 'Your units' }).getByRole('link', { name: 'Change units' }).click();
    await page.getByRole('heading', { level: 1, name: 'Preferences' }).waitFor();

    const pressure = page.getByRole('group', { name: 'Pressure' });
    const psi = pressure.getByRole('radio', { name: 'psi', exact: true });
    expect(await psi.isChecked()).toBe(false);
    // The whole tile is the target; a person taps its label.
    await pressure.getByText('psi', { exact: true }).click();
    expect(await psi.isChecked()).toBe(true);
    await page.getByText('You have unsaved changes.').waitFor();
    await page.getByRole('button', { name: 'Save preferences' }).click();
    await page.getByText('Preferences saved').waitFor();

    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Preferences' }).waitFor();
    expect(await page.getByRole('group', { name: 'Pressure' }).getByRole('radio', { name: 'psi', exact: true }).isChecked()).toBe(true);
    expect(await page.getByRole('group', { name: 'Pressure' }).getByRole('radio', { name: 'bar', exact: true }).isChecked()).toBe(false);

    // Home shows the same unit.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Home', exact: true }).click();
    const units = page.getByRole('region', { name: 'Your units' });
    await units.waitFor();
    expect(await units.getByRole('definition').first().textContent()).toBe('psi');
  });
});
