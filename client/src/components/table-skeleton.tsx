import { Skeleton, Stack } from '@mantine/core';

type TableSkeletonProps = { rows?: number; label: string };

export function TableSkeleton({ rows = 3, label }: TableSkeletonProps) {
  return (
    <Stack gap="xs" role="status" aria-label={label}>
      {Array.from({ length: rows }, (_, index) => (
        <Skeleton key={index} h="2.5rem" radius="sm" />
      ))}
    </Stack>
  );
}
