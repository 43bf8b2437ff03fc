import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { installFakeFetch, json } from '../../../testing/fake-fetch';
import { renderApp } from '../../../testing/render-app';

describe('sign-in page', () => {
  it('when the API uses the local stand-in, shows the GitHub button and says so', async () => {
    const network = installFakeFetch({ 'GET /api/auth/config': json({ provider: 'github', localStandIn: true }) });
    renderApp('/sign-in?returnTo=%2Flibrary%3Fq%3Dlinalool');

    expect(await screen.findByText(/local stand-in provider/i)).toBeTruthy();
    expect(screen.getByText(/demo identities/i)).toBeTruthy();
    const button = screen.getByRole('link', { name: 'Sign in with GitHub' });
    // A plain link: the browser leaves the app for the OAuth flow (no fetch).
    expect(button.getAttribute('href')).toBe('/auth/github?returnTo=%2Flibrary%3Fq%3Dlinalool');
    expect(screen.getByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(network.made('GET', '/api/v1/me')).toHaveLength(0);
  });

  it('when the real provider is configured, shows no stand-in note', async () => {
    const network = installFakeFetch({ 'GET /api/auth/config': json({ provider: 'github', localStandIn: false }) });
    renderApp('/sign-in');

    await screen.findByRole('link', { name: 'Sign in with GitHub' });
    await waitFor(() => expect(screen.queryByText(/Checking how sign-in is set up/)).toBeNull());
    expect(network.made('GET', '/api/auth/config')).toHaveLength(1);
    expect(screen.queryByText(/local stand-in provider/i)).toBeNull();
    expect(screen.getByRole('link', { name: 'Sign in with GitHub' }).getAttribute('href')).toBe(
      '/auth/github?returnTo=%2Fidentify',
    );
  });

  it('when returnTo points off-site, the button returns to Identify instead', async () => {
    installFakeFetch({ 'GET /api/auth/config': json({ provider: 'github', localStandIn: true }) });
    renderApp('/sign-in?returnTo=%2F%2Fevil.example%2Fphish');

    const button = await screen.findByRole('link', { name: 'Sign in with GitHub' });
    expect(button.getAttribute('href')).toBe('/auth/github?returnTo=%2Fidentify');
  });

  it('when the provider refused, shows the message for ?error=denied', async () => {
    installFakeFetch({ 'GET /api/auth/config': json({ provider: 'github', localStandIn: true }) });
    renderApp('/sign-in?error=denied');

    expect((await screen.findByRole('alert')).textContent).toMatch(/cancelled or refused at the provider/);
  });

  it('when the error code is unknown, shows it as sent', async () => {
    installFakeFetch({ 'GET /api/auth/config': json({ provider: 'github', localStandIn: true }) });
    renderApp('/sign-in?error=token_exchange_failed');

    expect((await screen.findByRole('alert')).textContent).toContain('token_exchange_failed');
  });
});

describe('sign-in page without the API', () => {
  it('when the sign-in setup cannot be read, still offers the button and says why', async () => {
    installFakeFetch({ 'GET /api/auth/config': { status: 502 } });
    renderApp('/sign-in');

    expect((await screen.findByText(/sign-in setup could not be read/)).textContent).toContain('502');
    expect(screen.getByRole('link', { name: 'Sign in with GitHub' })).toBeTruthy();
  });
});
