import type { SessionUser } from '@limitbook/contracts';
import { describe, expect, it, vi } from 'vitest';
import { render, screen, within } from '@/testing/render';
import { AppLayout } from './app-layout';

const person = (role: SessionUser['role']): SessionUser => ({ id: `id-${role}`, email: `${role}@brackwater.example`, name: 'Sunniva Lind', role });

function navigation() {
  return within(screen.getByRole('navigation', { name: 'Main navigation' }));
}

describe('AppLayout navigation', () => {
  it.each(['reader', 'author', 'reviewer'] as const)('shows the %s role the library and no admin pages', (role) => {
    render(
      <AppLayout user={person(role)} onSignOut={() => {}}>
        page
      </AppLayout>,
    );

    expect(navigation().getByRole('link', { name: 'Library' })).toBeInTheDocument();
    for (const name of ['Users', 'Mail', 'Audit log']) expect(navigation().queryByRole('link', { name })).not.toBeInTheDocument();
    expect(navigation().queryByText('Admin')).not.toBeInTheDocument();
  });

  it('shows an admin the admin pages too', () => {
    render(
      <AppLayout user={person('admin')} onSignOut={() => {}}>
        page
      </AppLayout>,
    );

    for (const name of ['Library', 'Users', 'Mail', 'Audit log']) expect(navigation().getByRole('link', { name })).toBeInTheDocument();
  });

  it('marks the current page and offers sign-out in the user menu', async () => {
    const onSignOut = vi.fn();
    const { user } = render(
      <AppLayout user={person('reviewer')} onSignOut={onSignOut}>
        page
      </AppLayout>,
      { route: '/library' },
    );

    expect(navigation().getByRole('link', { name: 'Library' })).toHaveAttribute('aria-current', 'page');
    await user.click(screen.getByRole('button', { name: 'Account menu for Sunniva Lind' }));
    expect(screen.getByText('Reviewer', { selector: '.mantine-Badge-label' })).toBeInTheDocument();
    await user.click(screen.getByRole('menuitem', { name: 'Sign out' }));
    expect(onSignOut).toHaveBeenCalledOnce();
  });
});
