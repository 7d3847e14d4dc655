import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { buildJob } from '../testing/build-job';
import { buildPhoto } from '../testing/build-job-extras';
import { FakeXhr, formFields, stubXhr } from '@/testing/fake-xhr';
import { JobPhotos } from './job-photos';

const ID = buildJob().id;
const photosRoute = `GET /api/jobs/${ID}/photos`;
const UPLOAD_URL = new RegExp(`^/api/jobs/${ID}/photos/[0-9a-f-]{36}$`);

/** jsdom has no object URLs; the stand-ins are removed again after each test. */
const realObjectUrls = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
const revoked: string[] = [];
beforeEach(() => {
  let count = 0;
  URL.createObjectURL = () => `blob:photo-${++count}`;
  URL.revokeObjectURL = (url: string) => void revoked.push(url);
});
afterEach(() => {
  URL.createObjectURL = realObjectUrls.create;
  URL.revokeObjectURL = realObjectUrls.revoke;
  revoked.length = 0;
});

const JPEG_START = [0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01];
const jpeg = (name: string) =>
  new File([new Uint8Array([...JPEG_START, 1, 2, 3])], name, { type: 'image/jpeg' });
const imageReply = () =>
  new Response('webp-bytes', { status: 200, headers: { 'Content-Type': 'image/webp' } });

function uploader() {
  return screen.getByRole('region', { name: 'Add photos' });
}

function uploadRow(name: string) {
  return within(screen.getByRole('list', { name: 'Uploads' })).getByRole('listitem', { name });
}

describe('Photo uploader', () => {
  it('refuses a program renamed .jpg by its bytes, and a 20 MB photo by its size, sending neither', async () => {
    setAccessToken('t');
    stubXhr();
    mockApi({ [photosRoute]: json([]) });
    const { user } = renderWithProviders(<JobPhotos jobId={ID} />);
    await screen.findByText(/No photos yet/);

    // The browser names a file's type from its name: this program says it is a JPEG.
    const program = new File(
      [new Uint8Array([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00, 0x04, 0x00, 0x00, 0x00])],
      'pond.jpg',
      { type: 'image/jpeg' },
    );
    const huge = new File([new Uint8Array(20 * 1024 * 1024)], 'huge.jpg', { type: 'image/jpeg' });
    await user.upload(screen.getByLabelText('Photos from this device'), [program, huge]);

    expect(
      await within(uploadRow('pond.jpg')).findByText(
        /“pond.jpg” is not a JPEG, PNG or WebP photo. Its contents are not an image/,
      ),
    ).toBeInTheDocument();
    expect(
      await within(uploadRow('huge.jpg')).findByText(
        /“huge.jpg” is 20 MB; a photo can be at most 15 MB/,
      ),
    ).toBeInTheDocument();
    expect(FakeXhr.sent).toHaveLength(0);
  });

  it('refuses a file whose type is not a photo at all', async () => {
    setAccessToken('t');
    stubXhr();
    mockApi({ [photosRoute]: json([]) });
    renderWithProviders(<JobPhotos jobId={ID} />);
    // The picker offers only images; a file chosen around it is checked all the same.
    const user = userEvent.setup({ applyAccept: false });
    await screen.findByText(/No photos yet/);

    await user.upload(
      screen.getByLabelText('Photos from this device'),
      new File(['MZ'], 'setup.exe', { type: 'application/x-msdownload' }),
    );
    expect(
      await screen.findByText(/“setup.exe” is not a JPEG, PNG or WebP photo/),
    ).toBeInTheDocument();
    expect(FakeXhr.sent).toHaveLength(0);
  });

  it('puts the photo as multipart with the bearer token, shows its progress, then shows it', async () => {
    setAccessToken('t');
    stubXhr();
    const stored = buildPhoto({ caption: 'North corner' });
    const server = mockApi({
      [photosRoute]: json([]),
      [`GET ${stored.thumbnailPath}`]: imageReply(),
    });
    const { user } = renderWithProviders(<JobPhotos jobId={ID} />);
    await screen.findByText(/No photos yet/);

    const camera = screen.getByLabelText('Photo from the camera');
    expect(camera).toHaveAttribute('accept', 'image/*');
    expect(camera).toHaveAttribute('capture', 'environment');
    await user.click(within(uploader()).getByRole('radio', { name: 'Before' }));
    await user.type(within(uploader()).getByLabelText(/^Caption/), 'North corner');
    await user.upload(camera, jpeg('site.jpg'));

    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    const xhr = FakeXhr.sent[0]!;
    expect(xhr.method).toBe('PUT');
    expect(xhr.url).toMatch(UPLOAD_URL);
    expect(xhr.headers.authorization).toBe('Bearer t');
    const fields = formFields(xhr.body);
    expect(fields.photo).toBeInstanceOf(File);
    expect((fields.photo as File).name).toBe('site.jpg');
    expect(fields.kind).toBe('before');
    expect(fields.caption).toBe('North corner');

    xhr.progress(40, 100);
    const bar = within(uploadRow('site.jpg')).getByRole('progressbar', {
      name: 'Upload of site.jpg',
    });
    expect(bar).toHaveAttribute('aria-valuenow', '40');
    expect(within(uploadRow('site.jpg')).getByText('Uploading… 40 %')).toBeInTheDocument();

    await xhr.respond(201, stored);
    expect(await within(uploadRow('site.jpg')).findByText('Uploaded')).toBeInTheDocument();
    expect(bar).toHaveAttribute('aria-valuenow', '100');
    const gallery = await screen.findByRole('list', { name: 'Photos' });
    expect(await within(gallery).findByRole('img', { name: 'North corner' })).toHaveAttribute(
      'src',
      'blob:photo-1',
    );
    expect(server.callsTo(`GET ${stored.thumbnailPath}`)[0]?.headers.authorization).toBe(
      'Bearer t',
    );
  });

  it('tries a failed upload again under the same photo id', async () => {
    setAccessToken('t');
    stubXhr();
    const stored = buildPhoto({ kind: 'progress', caption: '' });
    mockApi({ [photosRoute]: json([]), [`GET ${stored.thumbnailPath}`]: imageReply() });
    const { user } = renderWithProviders(<JobPhotos jobId={ID} />);
    await screen.findByText(/No photos yet/);

    await user.upload(screen.getByLabelText('Photos from this device'), jpeg('trench.jpg'));
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    await FakeXhr.sent[0]!.respond(502, {
      statusCode: 502,
      error: 'Bad Gateway',
      message: 'The photo store cannot be reached. Try again in a moment.',
      code: 'PHOTO_STORE_UNAVAILABLE',
    });
    const row = uploadRow('trench.jpg');
    expect(
      await within(row).findByText(/Not uploaded: The photo store cannot be reached/),
    ).toBeInTheDocument();

    await user.click(within(row).getByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(2));
    expect(FakeXhr.sent[1]!.url).toBe(FakeXhr.sent[0]!.url);
    // The first try got through after all: the server answers 200 for the same bytes.
    await FakeXhr.sent[1]!.respond(200, stored);
    expect(await within(row).findByText('Already uploaded')).toBeInTheDocument();
  });

  it('takes several photos dropped on the area and uploads them one after the other', async () => {
    setAccessToken('t');
    stubXhr();
    const first = buildPhoto({ id: '00000000-0000-4000-8000-00000000f0a1', kind: 'progress' });
    const second = buildPhoto({ id: '00000000-0000-4000-8000-00000000f0a2', kind: 'progress' });
    mockApi({
      [photosRoute]: json([]),
      [`GET ${first.thumbnailPath}`]: imageReply(),
      [`GET ${second.thumbnailPath}`]: imageReply(),
    });
    renderWithProviders(<JobPhotos jobId={ID} />);
    await screen.findByText(/No photos yet/);

    const area = screen.getByRole('group', { name: 'Drop photos here' });
    fireEvent.dragEnter(area, { dataTransfer: { files: [] } });
    fireEvent.drop(area, { dataTransfer: { files: [jpeg('one.jpg'), jpeg('two.jpg')] } });

    await waitFor(() => expect(FakeXhr.sent).toHaveLength(1));
    expect(within(uploadRow('two.jpg')).getByText('Waiting to upload')).toBeInTheDocument();
    expect(formFields(FakeXhr.sent[0]!.body).kind).toBe('progress');
    await FakeXhr.sent[0]!.respond(201, first);
    await waitFor(() => expect(FakeXhr.sent).toHaveLength(2));
    expect(FakeXhr.sent[1]!.url).not.toBe(FakeXhr.sent[0]!.url);
    await FakeXhr.sent[1]!.respond(201, second);
    expect(await within(uploadRow('two.jpg')).findByText('Uploaded')).toBeInTheDocument();
    expect(await screen.findByText('2 photos')).toBeInTheDocument();
  });
});

describe('Photo gallery', () => {
  const photos = [
    buildPhoto({ id: '00000000-0000-4000-8000-00000000f001', kind: 'before', caption: 'Lawn' }),
    buildPhoto({ id: '00000000-0000-4000-8000-00000000f002', kind: 'progress', caption: 'Dug' }),
    buildPhoto({ id: '00000000-0000-4000-8000-00000000f003', kind: 'ticket', caption: 'Rock' }),
    buildPhoto({ id: '00000000-0000-4000-8000-00000000f004', kind: 'after', caption: 'Done' }),
  ];
  const imageRoutes = Object.fromEntries(
    photos.flatMap((photo) => [
      [`GET ${photo.thumbnailPath}`, imageReply()],
      [`GET ${photo.imagePath}`, imageReply()],
    ]),
  );

  it('filters by kind, opens a photo, and shows before and after side by side', async () => {
    setAccessToken('t');
    const server = mockApi({ [photosRoute]: json(photos), ...imageRoutes });
    const { user, unmount } = renderWithProviders(<JobPhotos jobId={ID} />);

    const gallery = await screen.findByRole('list', { name: 'Photos' });
    expect(within(gallery).getAllByRole('listitem')).toHaveLength(4);
    const filter = screen.getByRole('radiogroup', { name: 'Show photos' });
    await user.click(within(filter).getByRole('radio', { name: 'Tickets' }));
    expect(within(gallery).getAllByRole('listitem')).toHaveLength(1);
    expect(within(gallery).getByText('Rock')).toBeInTheDocument();
    expect(screen.getByText('1 of 4 photos')).toBeInTheDocument();
    await user.click(within(filter).getByRole('radio', { name: 'Progress' }));
    expect(within(gallery).getByText('Dug')).toBeInTheDocument();
    expect(within(gallery).queryByText('Rock')).toBeNull();

    await user.click(within(gallery).getByRole('button', { name: 'Open Dug' }));
    const viewer = await screen.findByRole('dialog', { name: 'Dug' });
    expect(await within(viewer).findByRole('img', { name: 'Dug' })).toHaveAttribute(
      'src',
      expect.stringMatching(/^blob:/),
    );
    expect(server.callsTo(`GET ${photos[1]!.imagePath}`)[0]?.headers.authorization).toBe(
      'Bearer t',
    );
    await user.keyboard('{Escape}');
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());

    await user.click(within(filter).getByRole('radio', { name: 'Before and after' }));
    const before = screen.getByRole('region', { name: 'Before' });
    const after = screen.getByRole('region', { name: 'After' });
    expect(await within(before).findByRole('img', { name: 'Lawn' })).toBeInTheDocument();
    expect(await within(after).findByRole('img', { name: 'Done' })).toBeInTheDocument();
    expect(server.callsTo(`GET ${photos[3]!.imagePath}`)).toHaveLength(1);

    // Object URLs are given back when the photos leave the page.
    act(() => unmount());
    expect(revoked.length).toBeGreaterThan(0);
  });
});
