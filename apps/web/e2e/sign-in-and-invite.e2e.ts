import { describe, expect, it } from 'vitest';
import { useAppUnderTest } from './support/app-under-test';
import { openPage } from './support/browser';
import { demo, signIn, signOut } from './support/flows';

describe('sign-in, roles and invitations in the built app', () => {
  const app = useAppUnderTest();

  it('a reader reaches the library; an admin invites a colleague who joins through the mailed link', async () => {
    const { context, page, problems } = await openPage(app.browser, app.server.baseUrl);
    try {
      // A protected page sends an anonymous visitor to sign-in and back afterwards.
      await page.goto('/library');
      await page.waitForURL(/\/sign-in\?next=%2Flibrary/);

      await page.getByLabel('E-mail').fill(demo.reader.email);
      await page.getByLabel(/^Password/).fill(demo.reader.password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(/\/library$/);
      await page.getByRole('heading', { level: 1, name: /, Tomas$/ }).waitFor();
      await page.getByRole('heading', { name: 'Collections' }).waitFor();
      const nav = page.getByRole('navigation', { name: 'Main navigation' });
      expect(await nav.getByRole('link', { name: 'Library' }).count()).toBe(1);
      expect(await nav.getByRole('link', { name: 'Users' }).count()).toBe(0);

      // The session survives a reload through the refresh cookie.
      await page.reload();
      await page.getByRole('heading', { name: 'Collections' }).waitFor();

      await signOut(page, demo.reader.name);
      await page.goto('/library');
      await page.waitForURL(/\/sign-in/);

      await signIn(page, demo.admin.email, demo.admin.password);
      await page.getByRole('navigation', { name: 'Main navigation' }).getByRole('link', { name: 'Users' }).click();
      await page.getByRole('heading', { name: 'Users' }).waitFor();
      await page.getByRole('cell', { name: /tomas\.wren@brackwater\.example/ }).waitFor();

      const invitee = { email: `ines.varga.${Date.now()}@brackwater.example`, name: 'Ines Varga', password: 'drawn-to-the-limit-42' };
      await page.getByRole('button', { name: 'Invite user' }).click();
      const dialog = page.getByRole('dialog', { name: 'Invite a colleague' });
      await dialog.getByLabel('E-mail').fill(invitee.email);
      await dialog.getByLabel(/^Name/).fill(invitee.name);
      await dialog.getByRole('combobox', { name: 'Role' }).click();
      await page.getByRole('option', { name: 'Author' }).click();
      await dialog.getByRole('button', { name: 'Send invitation' }).click();
      await dialog.waitFor({ state: 'hidden' });
      const row = page.getByRole('row', { name: new RegExp(invitee.email.replace(/\./g, '\\.')) });
      await row.getByText('Invited').waitFor();

      await page.getByRole('navigation', { name: 'Main navigation' }).getByRole('link', { name: 'Mail' }).click();
      const inbox = page.getByRole('list', { name: 'Captured mail' });
      await inbox.getByRole('button', { name: new RegExp(invitee.email.replace(/\./g, '\\.')) }).click();
      const message = page.getByRole('article');
      await message.getByRole('heading').waitFor();
      await message.getByText(invitee.email).first().waitFor();
      const link = message.getByRole('link', { name: /\/accept-invite\?token=/ });
      const href = await link.getAttribute('href');
      expect(href).toMatch(new RegExp(`^${app.server.baseUrl}/accept-invite\\?token=`));

      await link.click();
      await page.waitForURL(/\/accept-invite\?token=/);
      await page.getByRole('heading', { name: 'Join your team on Limitbook' }).waitFor();
      await page.getByLabel(/^Your name/).fill(invitee.name);
      await page.getByLabel(/^Choose a password/).fill(invitee.password);
      await page.getByLabel(/^Repeat the password/).fill(invitee.password);
      await page.getByRole('button', { name: 'Create my account' }).click();
      await page.waitForURL(/\/sign-in/);
      await page.getByText('Your account is ready.').waitFor();

      await signIn(page, invitee.email, invitee.password);
      await page.getByRole('heading', { name: 'Collections' }).waitFor();
      await page.getByRole('button', { name: `Account menu for ${invitee.name}` }).click();
      await page.getByRole('menu').getByText('Author', { exact: true }).waitFor();

      expect(problems.filter((line) => !/status of 401/.test(line))).toEqual([]);
    } catch (error) {
      throw new Error(`${error instanceof Error ? error.message : String(error)}\n--- server output ---\n${app.server.output()}`, { cause: error });
    } finally {
      await context.close();
    }
  });
});
