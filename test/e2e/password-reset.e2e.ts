import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoColleagues, launchBrowser, readMail, submitSignIn, tokenLink, type ListedUser, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;
let colleague: ListedUser;

beforeAll(async () => {
  browser = await launchBrowser();
  const technicians = await demoColleagues(browser, 'technician');
  expect(technicians.length).toBeGreaterThanOrEqual(2);
  // Not the one the preferences test uses, so the two never meet.
  colleague = technicians[1]!;
});

afterAll(async () => {
  await browser?.close();
});

describe('forgotten password', () => {
  it('sends a link that sets a new password, which then signs in', async () => {
    const newPassword = `ferrule-reel-${Date.now().toString(36)}`;
    const page = await browser.newPage({ viewport: 'phone' });
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Forgot password?' }).click();
    await page.getByRole('heading', { level: 1, name: 'Reset your password' }).waitFor();

    const requestedAt = new Date();
    const form = page.getByRole('form', { name: 'Request a password reset' });
    await form.getByLabel('E-mail', { exact: true }).fill(colleague.email);
    await form.getByRole('button', { name: 'Send reset link' }).click();
    await page.getByText('Check your e-mail').waitFor();

    const mail = await readMail(colleague.email, { subject: /reset/i, since: requestedAt });
    expect(mail.text).toContain(`Hello ${colleague.name},`);
    const link = tokenLink(mail);
    expect(new URL(link).pathname).toBe('/reset-password');

    await page.goto(link);
    await page.getByRole('heading', { level: 1, name: 'Choose a new password' }).waitFor();
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByRole('button', { name: 'Set new password' }).click();
    await page.getByText('Your new password is set').waitFor();
    await page.getByRole('link', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await submitSignIn(page, colleague.email, newPassword);
    await page.getByRole('heading', { level: 1, name: 'Technician home' }).waitFor();
    await page.getByText(`Signed in as ${colleague.name}.`).waitFor();

    // The link works once.
    const again = await browser.newPage();
    await again.goto(link);
    await again.getByLabel('New password', { exact: true }).fill('another-new-password-77');
    await again.getByRole('button', { name: 'Set new password' }).click();
    await again.getByText('This link has expired or has already been used').waitFor();

    // The old password no longer signs in.
    await again.goto('/sign-in');
    await submitSignIn(again, colleague.email);
    const alert = again.getByRole('form', { name: 'Sign in' }).getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toContain('The e-mail or password is not right');
  });
});
