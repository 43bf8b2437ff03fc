import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Role } from '../../lib/roles';
import { meReply } from '../../testing/factories';
import { apiError, installFakeFetch, json } from '../../testing/fake-fetch';
import { renderApp } from '../../testing/render-app';

const authConfig = json({ provider: 'github', localStandIn: true });

async function mainNavLabels(): Promise<string[]> {
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent ?? '');
}

describe('app shell', () => {
  it('when a curator is signed in, the header shows their name and role', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('curator', { displayName: 'Dana Okafor' }) });
    renderApp('/identify');

    expect((await screen.findByTestId('current-role')).textContent).toBe('curator');
    expect(screen.getByTestId('current-person').textContent).toMatch(/Dana Okafor\s*·\s*(, role )?curator/);
    expect(screen.getByRole('heading', { level: 1, name: 'Identify' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeTruthy();
  });

  it.each<[Role, string[]]>([
    ['reader', ['Identify', 'Batch', 'Library', 'Editions', 'Overview', 'Tools']],
    ['contributor', ['Identify', 'Batch', 'Library', 'Editions', 'Overview', 'Submit', 'Tools']],
    ['curator', ['Identify', 'Batch', 'Library', 'Editions', 'Overview', 'Submit', 'Review desk', 'Tools']],
    ['admin', ['Identify', 'Batch', 'Library', 'Editions', 'Overview', 'Submit', 'Review desk', 'Tools', 'Admin']],
  ])('when a %s is signed in, the navigation offers exactly their screens', async (role, labels) => {
    installFakeFetch({ 'GET /api/v1/me': meReply(role) });
    renderApp('/library');

    expect(await mainNavLabels()).toEqual(labels);
  });

  it('when the session is missing, /me answers 401 and the person lands on sign-in with returnTo', async () => {
    installFakeFetch({
      'GET /api/v1/me': apiError(401, 'UNAUTHENTICATED', 'Sign in first.'),
      'GET /api/auth/config': authConfig,
    });
    const { router } = renderApp('/library?q=eugenol');

    const button = await screen.findByRole('link', { name: 'Sign in with GitHub' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('returnTo')).toBe('/library?q=eugenol');
    expect(button.getAttribute('href')).toBe('/auth/github?returnTo=%2Flibrary%3Fq%3Deugenol');
    expect(screen.queryByTestId('current-role')).toBeNull();
  });

  it('when /me keeps failing with a 500, tries three times, then says Ionfolio could not start', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': apiError(500, 'INTERNAL', 'Something went wrong on our side.') });
    const { router } = renderApp('/identify');

    const alert = await screen.findByRole('alert');
    expect(network.made('GET', '/api/v1/me')).toHaveLength(3);
    expect(alert.textContent).toContain('Ionfolio could not start');
    expect(alert.textContent).toContain('Something went wrong on our side.');
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/identify');
  });

  it('when a reader opens /admin/users, sees the not-allowed page and no user list is fetched', async () => {
    const network = installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/admin/users');

    expect(await screen.findByText('Not allowed for your role')).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('This page is not available to you');
    expect(screen.getByText(/needs the/).textContent).toMatch(/needs the admin role; you are signed in as a reader/);
    expect(network.made('GET', '/api/v1/admin/users')).toHaveLength(0);
  });

  it('when a contributor opens the review desk, sees the not-allowed page naming the curator role', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('contributor') });
    renderApp('/review');

    expect((await screen.findByText(/needs the/)).textContent).toMatch(/needs the curator role/);
  });

  it('when a curator opens the review desk, sees the review desk', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('curator') });
    renderApp('/review');

    expect(await screen.findByRole('heading', { level: 1, name: 'Review desk' })).toBeTruthy();
    expect(screen.queryByText('Not allowed for your role')).toBeNull();
  });

  it('when the address is the root, opens Identify', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    const { router } = renderApp('/');

    expect(await screen.findByRole('heading', { level: 1, name: 'Identify' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/identify');
  });

  it('when the address matches no screen, says so inside the app frame', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/no/such/page');

    expect(await screen.findByRole('heading', { level: 1, name: 'There is no page at this address' })).toBeTruthy();
    expect(screen.getByTestId('current-role').textContent).toBe('reader');
  });

  it('when Sign out is pressed, posts the guarded sign-out and goes to the sign-in page', async () => {
    const network = installFakeFetch({
      'GET /api/v1/me': meReply('curator'),
      'POST /auth/sign-out': { status: 204 },
      'GET /api/auth/config': authConfig,
    });
    const { router } = renderApp('/library');

    fireEvent.click(await screen.findByRole('button', { name: 'Sign out' }));

    await screen.findByRole('link', { name: 'Sign in with GitHub' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    // The cleared cache must not make the leaving page ask /me again.
    expect(network.made('GET', '/api/v1/me')).toHaveLength(1);
    const [signOut] = network.made('POST', '/auth/sign-out');
    expect(signOut?.headers.get('X-Requested-With')).toBe('ionfolio');
    expect(signOut?.headers.get('Content-Type')).toBe('application/json');
    expect(signOut?.credentials).toBe('include');
  });

  it('when the theme toggle is pressed, switches to dark and remembers it', async () => {
    installFakeFetch({ 'GET /api/v1/me': meReply('reader') });
    renderApp('/identify');

    const toggle = await screen.findByRole('button', { name: 'Dark theme' });
    expect(toggle.getAttribute('aria-pressed')).toBe('false');
    fireEvent.click(toggle);
    await waitFor(() => expect(toggle.getAttribute('aria-pressed')).toBe('true'));
    expect(document.documentElement.dataset.theme).toBe('dark');
    expect(window.localStorage.getItem('ionfolio-theme')).toBe('dark');
  });
});
