import { computeTakeoff, type Takeoff } from '@pondwright/shared/engine';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { setAccessToken } from '@/lib/api-client';
import { apiError, json, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { DEFAULT_TAKEOFF_INPUT } from '../utils/default-input';
import { TakeoffWorkspace } from './takeoff-workspace';

function defaultTakeoff(): Takeoff {
  const result = computeTakeoff(DEFAULT_TAKEOFF_INPUT);
  if (!result.ok) throw new Error('The default pond should compute');
  return result.takeoff;
}

const figure = (name: string) => screen.findByRole('article', { name });
const inBasin1 = () => within(screen.getByRole('group', { name: /^Basin 1/ }));

async function volumeGallons(): Promise<number> {
  const card = await figure('Water volume');
  const match = /([\d,]+) gal/.exec(card.textContent ?? '');
  if (!match?.[1]) throw new Error(`No volume in "${card.textContent}"`);
  return Number(match[1].replace(/,/g, ''));
}

// The whole form and its results re-render in jsdom on each keystroke, which takes a few seconds
// on a busy machine; the browser does it in milliseconds.
vi.setConfig({ testTimeout: 15_000 });

describe('TakeoffWorkspace', () => {
  it('shows the computed water volume of the default pond at once', async () => {
    renderWithProviders(<TakeoffWorkspace />);

    expect(await figure('Water volume')).toHaveTextContent('1,326 gal');
    expect(await figure('Water surface area')).toHaveTextContent('150 ft²');
    expect(await figure('Best pump')).toHaveTextContent('Mid-flow pump 3,000');
    expect(screen.getByRole('heading', { name: 'Safety' })).toBeInTheDocument();
    expect(screen.getByText(/utility locates before digging/)).toBeInTheDocument();
  });

  it('holds more water when the pond is made deeper', async () => {
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    const before = await volumeGallons();

    const depth = screen.getByLabelText('Max depth (ft)');
    await user.clear(depth);
    await user.type(depth, '3');

    await waitFor(async () => expect(await volumeGallons()).toBeGreaterThan(before));
  });

  it('shows the engine’s message on a negative depth, and in the summary', async () => {
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    await figure('Water volume');

    const depth = screen.getByLabelText('Max depth (ft)');
    await user.clear(depth);
    await user.type(depth, '-1');

    await waitFor(() => expect(depth).toHaveAccessibleDescription('Must be more than 0 ft.'));
    expect(depth).toHaveAttribute('aria-invalid', 'true');
    const summary = screen.getByRole('alert', { name: 'One field needs another look' });
    expect(within(summary).getByRole('button', { name: 'Basin 1 › Max depth' })).toBeVisible();
    expect(screen.getByText(/from the last measurements that computed/)).toBeInTheDocument();
  });

  it('shows the figures in metric when asked, from the engine’s display values', async () => {
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    await figure('Water volume');

    await user.click(screen.getByRole('radio', { name: 'Metric' }));

    await waitFor(async () => expect(await figure('Water volume')).toHaveTextContent('5,018 L'));
  });

  it('takes metric entries and converts them exactly: 4.572 m holds what 15 ft holds', async () => {
    const { user } = renderWithProviders(<TakeoffWorkspace unitSystem="metric" />);
    expect(await figure('Water volume')).toHaveTextContent('5,018 L');

    const length = inBasin1().getByLabelText('Length (m)');
    expect(length).toHaveValue('4.57');
    expect(inBasin1().getByLabelText('Max depth (m)')).toHaveValue('0.61');
    expect(inBasin1().getByLabelText('Shelf 1 width (cm)')).toHaveValue('30.5');

    await user.clear(length);
    await user.type(length, '6');
    await waitFor(async () => expect(await figure('Water volume')).toHaveTextContent('6,912 L'));

    await user.clear(length);
    await user.type(length, '4.572');
    await waitFor(async () => expect(await figure('Water volume')).toHaveTextContent('5,018 L'));

    await user.click(screen.getByRole('radio', { name: 'US units' }));
    await waitFor(async () => expect(await figure('Water volume')).toHaveTextContent('1,326 gal'));
    expect(inBasin1().getByLabelText('Length (ft)')).toHaveValue('15');
  });

  it('switches systems back and forth without changing the stored measurements', async () => {
    setAccessToken('t');
    const server = mockApi({ 'POST /api/takeoff': json(defaultTakeoff()) });
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    await figure('Water volume');
    const us = () => user.click(screen.getByRole('radio', { name: 'US units' }));
    const metric = () => user.click(screen.getByRole('radio', { name: 'Metric' }));

    await metric();
    expect(inBasin1().getByLabelText('Length (m)')).toHaveValue('4.57');
    await us();
    expect(inBasin1().getByLabelText('Length (ft)')).toHaveValue('15');
    await metric();
    await us();
    await waitFor(async () => expect(await figure('Water volume')).toHaveTextContent('1,326 gal'));

    await user.click(screen.getByRole('button', { name: 'Check on server' }));
    expect(await screen.findByText('The server agrees')).toBeInTheDocument();
    expect(server.callsTo('POST /api/takeoff')[0]?.body).toEqual(DEFAULT_TAKEOFF_INPUT);
  });

  it('keeps a metric entry as typed across a switch to US and back', async () => {
    const { user } = renderWithProviders(<TakeoffWorkspace unitSystem="metric" />);
    await figure('Water volume');

    const width = inBasin1().getByLabelText('Width (m)');
    await user.clear(width);
    await user.type(width, '2');
    await user.click(screen.getByRole('radio', { name: 'US units' }));
    expect(inBasin1().getByLabelText('Width (ft)')).toHaveValue('6.56');
    await user.click(screen.getByRole('radio', { name: 'Metric' }));

    expect(inBasin1().getByLabelText('Width (m)')).toHaveValue('2');
  });

  it('explains a figure from its (?) button', async () => {
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    const card = await figure('Water volume');

    await user.click(within(card).getByRole('button', { name: 'How water volume was computed' }));

    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText('Formula')).toBeInTheDocument();
    expect(within(dialog).getByText('Sources')).toBeInTheDocument();
  });

  it('checks the form’s input on the server and says the figures match', async () => {
    setAccessToken('t');
    const server = mockApi({ 'POST /api/takeoff': json(defaultTakeoff()) });
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    await figure('Water volume');

    await user.click(screen.getByRole('button', { name: 'Check on server' }));

    expect(await screen.findByText('The server agrees')).toBeInTheDocument();
    expect(screen.getByText(/water volume 1,326 gal included/)).toBeInTheDocument();
    expect(server.callsTo('POST /api/takeoff')[0]?.body).toEqual(DEFAULT_TAKEOFF_INPUT);
  });

  it('lists the figures where the server disagrees', async () => {
    setAccessToken('t');
    const takeoff = defaultTakeoff();
    const changed = {
      ...takeoff,
      explanations: takeoff.explanations.map((e) =>
        e.figure === 'water.volumeGallons'
          ? { ...e, value: 1400, display: { value: 1400, unit: 'gal' } }
          : e,
      ),
    };
    mockApi({ 'POST /api/takeoff': json(changed) });
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    await figure('Water volume');

    await user.click(screen.getByRole('button', { name: 'Check on server' }));

    expect(await screen.findByText(/1 of \d+ figures differ on the server/)).toBeInTheDocument();
    expect(screen.getByRole('cell', { name: '1,400 gal' })).toBeInTheDocument();
  });

  it('shows the server’s field messages when it refuses the input', async () => {
    setAccessToken('t');
    mockApi({
      'POST /api/takeoff': apiError(400, 'Some fields need attention', [
        { field: 'site.haulVehicleId', message: 'Not in the vehicle list.' },
      ]),
    });
    const { user } = renderWithProviders(<TakeoffWorkspace />);
    await figure('Water volume');

    await user.click(screen.getByRole('button', { name: 'Check on server' }));

    expect(await screen.findByText('The server found problems')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Site › Haul vehicle' })).toBeInTheDocument();
    expect(screen.getByText(/Not in the vehicle list/)).toBeInTheDocument();
  });

  it('measures a freeform outline that bends inward with the polygon module, loaded on demand', async () => {
    const lShaped = {
      ...DEFAULT_TAKEOFF_INPUT,
      basins: [
        {
          ...DEFAULT_TAKEOFF_INPUT.basins[0]!,
          outline: {
            shape: 'freeform' as const,
            pointsFt: [
              { xFt: 0, yFt: 0 },
              { xFt: 16, yFt: 0 },
              { xFt: 16, yFt: 8 },
              { xFt: 8, yFt: 8 },
              { xFt: 8, yFt: 14 },
              { xFt: 0, yFt: 14 },
            ],
          },
        },
      ],
    };
    renderWithProviders(<TakeoffWorkspace initialValues={lShaped} />);

    expect(await figure('Water surface area')).toHaveTextContent('176 ft²');
    expect(screen.queryByText(/polygon-offset module/)).not.toBeInTheDocument();
  });
});
