import {
  computeTakeoff,
  defaultEngineParameters,
  examplePondInput,
  type Takeoff,
} from '@pondwright/shared/engine';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders, screen } from '@/testing/render';
import { crossSection, planDrawing } from '@pondwright/shared/drawings';
import { CrossSection } from './cross-section';
import { CrossSectionSvg } from './cross-section-svg';
import { PlanSvg } from './plan-svg';
import { PlanView } from './plan-view';
import { PumpChart } from './pump-chart';
import { TakeoffDrawings } from './takeoff-drawings';

const pond = examplePondInput();

function takeoffOf(input = pond): Takeoff {
  const result = computeTakeoff(input, defaultEngineParameters);
  if (!result.ok) throw new Error('the example pond computes');
  return result.takeoff;
}

describe('PlanView', () => {
  it('draws the default pond’s outline and labels it 15 ft by 10 ft', () => {
    const { container } = renderWithProviders(<PlanView input={pond} />);
    const figure = screen.getByRole('img', { name: /plan view/i });
    expect(figure).toHaveAttribute('viewBox');
    expect(figure).toHaveAttribute('width', '100%');
    expect(container.querySelectorAll('[data-part="outline"]')).toHaveLength(1);
    expect(container.querySelectorAll('[data-part="shelf"]')).toHaveLength(1);
    expect(container.querySelectorAll('[data-part="weir"]')).toHaveLength(1);
    expect(screen.getByText('15 ft')).toBeInTheDocument();
    expect(screen.getByText('10 ft')).toBeInTheDocument();
    expect(figure.querySelector('desc')).toHaveTextContent('15 ft long, 10 ft wide, one shelf');
  });

  it('labels in metres for a metric estimate', () => {
    renderWithProviders(<PlanView input={{ ...pond, unitSystem: 'metric' }} />);
    expect(screen.getByText('4.57 m')).toBeInTheDocument();
    expect(screen.getByText('3.05 m')).toBeInTheDocument();
  });
});

describe('CrossSection', () => {
  it('labels the maximum depth, the shelf depth and the overlap', () => {
    const { container } = renderWithProviders(<CrossSection input={pond} takeoff={takeoffOf()} />);
    expect(screen.getByRole('img', { name: /cross-section/i })).toBeInTheDocument();
    expect(screen.getByText('max 2 ft')).toBeInTheDocument();
    expect(screen.getByText('10 in')).toBeInTheDocument();
    expect(screen.getByText('1 ft overlap')).toBeInTheDocument();
    for (const part of ['liner', 'underlayment', 'gravel', 'rock', 'water-line']) {
      expect(container.querySelector(`[data-part="${part}"]`)).not.toBeNull();
    }
  });
});

describe('PlanSvg and CrossSectionSvg', () => {
  it('draw from drawing data alone, as the quote page gets it from the server', () => {
    // Through JSON, as the data travels: plain objects, no functions or class instances.
    const plan = JSON.parse(JSON.stringify(planDrawing(pond))) as ReturnType<typeof planDrawing>;
    const section = JSON.parse(JSON.stringify(crossSection(pond, takeoffOf()))) as NonNullable<
      ReturnType<typeof crossSection>
    >;
    const { container } = renderWithProviders(
      <>
        <PlanSvg plan={plan} />
        <CrossSectionSvg section={section} />
      </>,
    );
    expect(screen.getByRole('img', { name: /plan view/i })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /cross-section of basin 1/i })).toBeInTheDocument();
    expect(container.querySelectorAll('[data-part="outline"]')).toHaveLength(1);
    expect(container.querySelector('[data-part="liner"]')).not.toBeNull();
    expect(screen.getByText('max 2 ft')).toBeInTheDocument();
  });
});

describe('PumpChart', () => {
  it('draws one path per candidate pump plus the system curve', () => {
    const takeoff = takeoffOf();
    const { container } = renderWithProviders(<PumpChart takeoff={takeoff} />);
    const candidates = takeoff.hydraulics!.candidates.length;
    expect(candidates).toBeGreaterThan(1);
    expect(container.querySelectorAll('path[data-series="pump"]')).toHaveLength(candidates);
    expect(container.querySelectorAll('path[data-series="system"]')).toHaveLength(1);
    expect(container.querySelector('[data-series="required-flow"]')).not.toBeNull();
    expect(screen.getByRole('img', { name: /system curve/i })).toBeInTheDocument();
  });

  it('draws nothing without a pump run', () => {
    const { container } = renderWithProviders(
      <PumpChart takeoff={{ ...takeoffOf(), hydraulics: null }} />,
    );
    expect(container.querySelector('svg[role="img"]')).toBeNull();
  });
});

describe('TakeoffDrawings', () => {
  function Harness({ takeoff }: { takeoff: Takeoff }) {
    const [input, setInput] = useState<unknown>(pond);
    return (
      <>
        <button type="button" onClick={() => setInput({ ...pond, basins: 'nonsense' })}>
          Break
        </button>
        <TakeoffDrawings input={input} takeoff={takeoff} />
      </>
    );
  }

  it('keeps drawing the last valid measurements while the current ones do not validate', async () => {
    const { user } = renderWithProviders(<Harness takeoff={takeoffOf()} />);
    expect(screen.getByRole('img', { name: /plan view/i })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Break' }));
    expect(screen.getByRole('img', { name: /plan view/i })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /cross-section/i })).toBeInTheDocument();
  });
});
