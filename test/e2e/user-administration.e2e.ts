import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, readMail, signIn, submitSignIn, tokenLink, uniqueEmail, type TestBrowser } from '../support/browser.js';

let browser: TestBrowser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const ADMIN = 'admin@kestrel-ridge.example';

/** The row of the users table for this e-mail, after searching for it. */
async function findUserRow(page: Page, email: string) {
  await page.getByRole('searchbox', { name: 'Search users' }).fill(email);
  const row = page.getByRole('table', { name: 'Users' }).getByRole('row').filter({ hasText: email });
  await row.waitFor();
  await expect.poll(() => page.getByRole('table', { name: 'Users' }).getByRole('row').count()).toBe(2);
  return row;
}

describe('user administration', () => {
  it('invites a user who sets a password and signs in, then changes their role and deactivates them', async () => {
    const email = uniqueEmail('wren.talbot');
    const name = 'Wren Talbot';
    const password = 'braided-hose-crimp-2042';

    // The administrator invites a technician for one site.
    const admin = await browser.newPage({ viewport: 'desktop' });
    await signIn(admin, ADMIN);
    await admin.getByRole('heading', { level: 1, name: 'Administrator home' }).waitFor();
    await admin.getByRole('complementary').getByRole('link', { name: 'Users' }).click();
    await admin.getByRole('heading', { level: 1, name: 'Users' }).waitFor();

    const invitedAt = new Date();
    await admin.getByRole('button', { name: 'Invite user' }).click();
    const dialog = admin.getByRole('dialog', { name: 'Invite user' });
    await dialog.getByLabel('E-mail', { exact: true }).fill(email);
    await dialog.getByLabel('Name', { exact: true }).fill(name);
    await dialog.getByLabel('Role', { exact: true }).selectOption({ label: 'Technician' });
    await dialog.getByRole('checkbox', { name: /Brackenfold Quarry/ }).check();
    expect(await dialog.getByRole('checkbox', { name: /All sites/ }).isChecked()).toBe(false);
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await admin.getByText(`Invitation sent to ${email}`).waitFor();

    const row = await findUserRow(admin, email);
    const cells = await row.getByRole('cell').allTextContents();
    expect(cells).toEqual(expect.arrayContaining([name, email, 'Technician', 'Brackenfold Quarry', 'Invited', 'Never']));

    // The invitation arrives with a link; the newcomer opens it in a browser of their own.
    const invitation = await readMail(email, { subject: /invited/i, since: invitedAt });
    expect(invitation.text).toContain(`Hello ${name},`);
    const link = tokenLink(invitation);
    expect(new URL(link).pathname).toBe('/accept-invite');

    const newcomer = await browser.newPage({ viewport: 'phone' });
    await newcomer.goto(link);
    await newcomer.getByRole('heading', { level: 1, name: 'Accept your invitation' }).waitFor();
    await newcomer.getByLabel('New password', { exact: true }).fill(password);
    await newcomer.getByRole('button', { name: 'Set password and finish' }).click();
    await newcomer.getByText('Your account is ready').waitFor();
    await newcomer.getByRole('link', { name: 'Sign in' }).click();
    await newcomer.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await submitSignIn(newcomer, email, password);
    await newcomer.getByRole('heading', { level: 1, name: 'Technician home' }).waitFor();
    await newcomer.getByText(`Signed in as ${name}.`).waitFor();

    // The administrator makes them a viewer on their page.
    await admin.reload();
    const activeRow = await findUserRow(admin, email);
    expect(await activeRow.getByRole('cell').allTextContents()).toContain('Active');
    await activeRow.getByRole('link', { name }).click();
    await admin.getByRole('heading', { level: 1, name }).waitFor();
    const details = admin.getByRole('form', { name: 'User details' });
    const role = details.getByLabel('Role', { exact: true });
    expect(await role.inputValue()).toBe('technician');
    await role.selectOption({ label: 'Viewer' });
    await details.getByRole('button', { name: 'Save changes' }).click();
    await admin.getByText('Changes saved', { exact: true }).waitFor();
    await expect.poll(() => details.getByRole('button', { name: 'Save changes' }).isDisabled()).toBe(true);
    await admin.reload();
    await admin.getByRole('heading', { level: 1, name }).waitFor();
    expect(await admin.getByRole('form', { name: 'User details' }).getByLabel('Role', { exact: true }).inputValue()).toBe('viewer');

    // A new role ends the sessions made under the old one; signing in again gives the viewer's home.
    await newcomer.reload();
    await newcomer.waitForURL((url) => url.pathname === '/sign-in');
    await submitSignIn(newcomer, email, password);
    await newcomer.getByRole('heading', { level: 1, name: 'Viewer home' }).waitFor();

    // The administrator deactivates them, after confirming.
    await admin.getByRole('button', { name: 'Deactivate user' }).click();
    const confirm = admin.getByRole('alertdialog', { name: `Deactivate ${name}?` });
    await confirm.getByRole('button', { name: 'Deactivate', exact: true }).click();
    await confirm.waitFor({ state: 'hidden' });
    await admin.getByText(`${name} is deactivated`, { exact: true }).waitFor();
    await admin.getByRole('main').getByText('Inactive', { exact: true }).waitFor();
    await admin.getByRole('link', { name: '← All users' }).click();
    const inactiveRow = await findUserRow(admin, email);
    await expect.poll(() => inactiveRow.getByRole('cell').allTextContents()).toContain('Inactive');

    // Their open session ends: the next page load sends them to sign in, and signing in is refused.
    await newcomer.reload();
    await newcomer.waitForURL((url) => url.pathname === '/sign-in');
    await newcomer.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
    await submitSignIn(newcomer, email, password);
    const refusal = newcomer.getByRole('form', { name: 'Sign in' }).getByRole('alert');
    await refusal.waitFor();
    expect(await refusal.textContent()).toContain('This account has been deactivated');
  });
});
