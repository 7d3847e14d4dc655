import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { browser } from '../lib/browser';
import { deferred } from './deferred';

function Greeting({ name }: { name: string }) {
  return <p>Hello, {name}</p>;
}

describe('deferred', () => {
  it('holds the place while the code loads, then shows the part', async () => {
    let arrive: (part: typeof Greeting) => void = () => {};
    const Part = deferred(() => new Promise<typeof Greeting>((resolve) => (arrive = resolve)));
    render(<Part name="Bram" loadingPlaceholder={<p>Holding the place</p>} />);

    expect(screen.getByText('Holding the place')).toBeInTheDocument();
    arrive(Greeting);
    expect(await screen.findByText('Hello, Bram')).toBeInTheDocument();
  });

  it('renders at once once loaded', async () => {
    const Part = deferred(() => Promise.resolve(Greeting));
    await Part.preload();
    render(<Part name="Bram" />);
    expect(screen.getByText('Hello, Bram')).toBeInTheDocument();
  });

  it('offers a reload when the code cannot be fetched', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const reload = vi.spyOn(browser, 'reload').mockImplementation(() => {});
    const Part = deferred<{ name: string }>(() => Promise.reject(new Error('offline')));
    render(<Part name="Bram" />);

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Part of this page didn’t load');
    await userEvent.click(screen.getByRole('button', { name: 'Reload the page' }));
    expect(reload).toHaveBeenCalledOnce();
  });
});
