import { Group, Text } from '@mantine/core';
import { PRODUCT_NAME } from '@/config/env';
import { BrandMark } from './brand-mark';

type BrandProps = { size?: 'sm' | 'lg' };

export function Brand({ size = 'sm' }: BrandProps) {
  return (
    <Group gap="xs" wrap="nowrap">
      <BrandMark size={size === 'lg' ? 40 : 30} />
      <Text component="span" fw={700} fz={size === 'lg' ? 'xl' : 'lg'} c="reed.9" lts="-0.01em">
        {PRODUCT_NAME}
      </Text>
    </Group>
  );
}
