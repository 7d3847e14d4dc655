import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { buildCompany } from '@/testing/factories';
import { apiError, json, mockApi, noContent } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { useCompany } from '../api/get-company';
import { CompanyLogo } from './company-logo';

/** jsdom has no object URLs; the stand-ins are removed again after each test. */
const realObjectUrls = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
const revoked: string[] = [];
function stubObjectUrls() {
  let count = 0;
  URL.createObjectURL = () => `blob:logo-${++count}`;
  URL.revokeObjectURL = (url: string) => void revoked.push(url);
}
afterEach(() => {
  URL.createObjectURL = realObjectUrls.create;
  URL.revokeObjectURL = realObjectUrls.revoke;
  revoked.length = 0;
});

function LogoSettings() {
  const company = useCompany();
  return company.data ? <CompanyLogo company={company.data} /> : null;
}

const png = (bytes: number, name = 'logo.png', type = 'image/png') =>
  new File([new Uint8Array(bytes)], name, { type });
const logoReply = () =>
  new Response('png-bytes', { status: 200, headers: { 'Content-Type': 'image/png' } });

function fileInput(): HTMLInputElement {
  const input = document.querySelector<HTMLInputElement>('input[type="file"]');
  if (!input) throw new Error('No file input on the page');
  return input;
}

/** The PUT requests, with the FormData each carried (the mock records only JSON bodies). */
function uploads(server: ReturnType<typeof mockApi>) {
  return server.fetch.mock.calls
    .filter(([, init]) => init?.method === 'PUT')
    .map(([, init]) => ({
      body: init?.body,
      headers: Object.fromEntries(new Headers(init?.headers).entries()),
    }));
}

describe('CompanyLogo', () => {
  it('refuses a file over 512 KB in the browser, without sending it', async () => {
    setAccessToken('t');
    const server = mockApi({ 'GET /api/company': json(buildCompany()) });
    const { user } = renderWithProviders(<LogoSettings />);

    expect(await screen.findByText(/No logo yet/)).toBeInTheDocument();
    await user.upload(fileInput(), png(600 * 1024, 'big-logo.png'));

    expect(
      await screen.findByText(/“big-logo.png” is 600 KB; the logo can be at most 512 KB/),
    ).toBeInTheDocument();
    expect(uploads(server)).toHaveLength(0);
  });

  it('refuses a file that is not a PNG or JPEG', async () => {
    setAccessToken('t');
    const server = mockApi({ 'GET /api/company': json(buildCompany()) });
    renderWithProviders(<LogoSettings />);
    // The picker offers only PNG and JPEG; a file dropped on it is checked all the same.
    const user = userEvent.setup({ applyAccept: false });

    await screen.findByText(/No logo yet/);
    await user.upload(fileInput(), png(2048, 'logo.gif', 'image/gif'));

    expect(await screen.findByText(/“logo.gif” is not a PNG or JPEG image/)).toBeInTheDocument();
    expect(uploads(server)).toHaveLength(0);
  });

  it('uploads a small PNG as multipart field `logo`, then shows it', async () => {
    setAccessToken('t');
    stubObjectUrls();
    const server = mockApi({
      'GET /api/company': [json(buildCompany()), json(buildCompany({ hasLogo: true }))],
      'PUT /api/company/logo': json(buildCompany({ hasLogo: true })),
      'GET /api/company/logo': logoReply(),
    });
    const { user } = renderWithProviders(<LogoSettings />);

    await screen.findByText(/No logo yet/);
    const file = png(20 * 1024);
    await user.upload(fileInput(), file);

    expect(await screen.findByText('Your quotes now show this logo.')).toBeInTheDocument();
    const [upload] = uploads(server);
    expect(upload?.body).toBeInstanceOf(FormData);
    const sent = (upload?.body as FormData).get('logo');
    expect(sent).toBeInstanceOf(File);
    expect((sent as File).name).toBe('logo.png');
    expect((sent as File).size).toBe(20 * 1024);
    // The browser writes the multipart Content-Type with its boundary; the client must not set one.
    expect(upload?.headers['content-type']).toBeUndefined();
    expect(upload?.headers.authorization).toBe('Bearer t');

    const image = await screen.findByRole('img', { name: 'Example Ponds Co logo' });
    expect(image).toHaveAttribute('src', 'blob:logo-1');
    expect(server.callsTo('GET /api/company/logo')[0]?.headers.authorization).toBe('Bearer t');
    expect(screen.getByLabelText(/^Replace the logo/)).toBeInTheDocument();
  });

  it('shows the server’s reason when it refuses the file', async () => {
    setAccessToken('t');
    mockApi({
      'GET /api/company': json(buildCompany()),
      'PUT /api/company/logo': apiError(400, 'That file is not a picture we can read.'),
    });
    const { user } = renderWithProviders(<LogoSettings />);

    await screen.findByText(/No logo yet/);
    await user.upload(fileInput(), png(1024));

    expect(await screen.findByText('That file is not a picture we can read.')).toBeInTheDocument();
  });

  it('removes the logo after asking', async () => {
    setAccessToken('t');
    stubObjectUrls();
    const server = mockApi({
      'GET /api/company': [json(buildCompany({ hasLogo: true })), json(buildCompany())],
      'GET /api/company/logo': logoReply(),
      'DELETE /api/company/logo': noContent(),
    });
    const { user } = renderWithProviders(<LogoSettings />);

    expect(await screen.findByRole('img', { name: 'Example Ponds Co logo' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove the logo' }));
    const dialog = await screen.findByRole('dialog', { name: 'Remove the logo?' });
    await user.click(within(dialog).getByRole('button', { name: 'Remove' }));

    expect(await screen.findByText(/No logo yet/)).toBeInTheDocument();
    expect(server.callsTo('DELETE /api/company/logo')).toHaveLength(1);
    expect(screen.queryByRole('img')).not.toBeInTheDocument();
    await waitFor(() => expect(revoked).toContain('blob:logo-1'));
  });
});
