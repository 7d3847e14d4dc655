import { rem } from '@mantine/core';

type BrandMarkProps = {
  /** Edge length in px, converted to rem. */
  size?: number;
};

const color = (token: string) => `var(--mantine-color-${token})`;

/** Pondwright's mark: a still pond with a boulder on its rim and reeds rising from it. */
export function BrandMark({ size = 32 }: BrandMarkProps) {
  return (
    <svg
      viewBox="0 0 32 32"
      width={rem(size)}
      height={rem(size)}
      aria-hidden="true"
      focusable="false"
    >
      <path
        d="M2.5 23.5c0-3.6 6-6.3 13.5-6.3s13.5 2.7 13.5 6.3S23.5 29.5 16 29.5 2.5 27 2.5 23.5z"
        fill={color('reed-8')}
      />
      <path
        d="M8 23.6c2.4 1.1 5.2 1.6 8 1.6"
        stroke={color('reed-3')}
        strokeWidth="1.2"
        strokeLinecap="round"
        fill="none"
      />
      <path
        d="M22.6 20.4c1.2-2.2 3.6-3.2 5.6-2.4 1.7.7 2.1 2.6 1.2 4.1-1.8.6-4.6.4-6.8-1.7z"
        fill={color('stone-4')}
      />
      <path
        d="M10.5 21.5C10.2 15 9 9.8 6.6 5.4"
        stroke={color('reed-6')}
        strokeWidth="1.8"
        strokeLinecap="round"
        fill="none"
      />
      <path
        d="M14.2 21C14.4 14.2 15.2 8.6 17.4 3.4"
        stroke={color('reed-5')}
        strokeWidth="1.8"
        strokeLinecap="round"
        fill="none"
      />
      <path
        d="M18 20.8c.6-4 1.9-7.3 4.2-10"
        stroke={color('reed-7')}
        strokeWidth="1.6"
        strokeLinecap="round"
        fill="none"
      />
      <rect
        x="15.6"
        y="5.6"
        width="2.6"
        height="6.2"
        rx="1.3"
        transform="rotate(18 16.9 8.7)"
        fill={color('clay-7')}
      />
    </svg>
  );
}
