import { describe, expect, it } from 'vitest';
import { ROLES, ROLE_LABELS } from '../../shared/roles';
import { buildUser, uniqueEmail } from '../support/builders';
import { openPage, screenshot, signInThroughForm } from '../support/browser';
import { withBrowserStack } from '../support/browser-suite';

const suite = withBrowserStack();

/** What the rail shows each role: every screen reads data; only administrators manage the team. */
const SHARED_SCREENS = ['Overview', 'State map', 'Recipes', 'Bench log', 'Planner', 'Shortlists', 'Calibrate', 'Library', 'Find'];
const NAV_FOR: Record<(typeof ROLES)[number], string[]> = {
  admin: [...SHARED_SCREENS, 'Team'],
  manager: SHARED_SCREENS,
  formulator: SHARED_SCREENS,
  scientist: SHARED_SCREENS,
  viewer: SHARED_SCREENS,
};

describe('signing in as each role', () => {
  for (const role of ROLES) {
    it(`${role}: signs in, sees only its screens in the rail, signs out`, async () => {
      const who = await buildUser({ role, name: `Browser ${ROLE_LABELS[role]}` });
      const { page, context, problems } = await openPage(suite.browser);
      await signInThroughForm(page, suite.stack.url, who.email, who.password);
      await expect.poll(() => page.getByTestId('signed-in-role').textContent()).toBe(ROLE_LABELS[role]);
      const links = await page.getByRole('navigation', { name: 'Main' }).getByRole('link').allTextContents();
      expect(links).toEqual(NAV_FOR[role]);
      await screenshot(page, `overview-${role}`);
      if (role !== 'admin') {
        await page.goto(`${suite.stack.url}/team`);
        await expect.poll(() => page.getByText('Only administrators manage the team.').isVisible()).toBe(true);
      }
      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.getByRole('heading', { name: 'Sign in' }).waitFor();
      await page.goto(`${suite.stack.url}/`);
      await page.waitForURL(/\/sign-in\?next=/);
      expect(problems.filter((p) => !p.includes('401'))).toEqual([]);
      await context.close();
    });
  }

  it('shows the same message for a wrong password next to the form', async () => {
    const who = await buildUser({ role: 'viewer' });
    const { page, context } = await openPage(suite.browser);
    await page.goto(`${suite.stack.url}/sign-in`);
    await page.getByLabel('E-mail').fill(who.email);
    await page.getByLabel('Password').fill('certainly-wrong');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toContain('E-mail or password is wrong');
    await screenshot(page, 'sign-in-error');
    await context.close();
  });
});

describe('inviting a person', () => {
  it('admin invites through the Team page; the invitee follows the link from the outbox, sets a password and signs in', async () => {
    const admin = await buildUser({ role: 'admin', name: 'Ilse Browser-Admin' });
    const { page, context, problems } = await openPage(suite.browser);
    await signInThroughForm(page, suite.stack.url, admin.email, admin.password);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Team' }).click();
    const email = uniqueEmail('newhire');
    const form = page.getByRole('form', { name: 'Invite a person' });
    await form.getByLabel('Name').fill('Noor Newhire');
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Role').selectOption('scientist');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByText(`Invitation sent to ${email}`).isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('cell', { name: email }).isVisible()).toBe(true);
    await screenshot(page, 'team-people');

    await page.getByRole('tab', { name: 'Outbox' }).click();
    await page.getByRole('button', { name: /You are invited to Gelwright/ }).first().click();
    const link = page.getByTestId('outbox-message-text').getByRole('link');
    const href = await link.first().getAttribute('href');
    expect(href).toContain(`${suite.stack.url}/accept-invitation?token=`);
    await screenshot(page, 'team-outbox');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();

    await page.goto(href!);
    await expect.poll(() => page.getByText('Welcome, Noor Newhire.').isVisible()).toBe(true);
    await page.getByLabel('New password').fill('noor-chooses-this');
    await page.getByLabel('Repeat the password').fill('noor-chooses-this');
    await screenshot(page, 'accept-invitation');
    await page.getByRole('button', { name: 'Set password and continue' }).click();
    await page.getByText('Your password is set.').waitFor();
    expect(await page.getByLabel('E-mail').inputValue()).toBe(email);
    await page.getByLabel('Password').fill('noor-chooses-this');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByTestId('signed-in-name').textContent()).toBe('Noor Newhire');
    expect(problems.filter((p) => !p.includes('401'))).toEqual([]);
    await context.close();
  });
});
