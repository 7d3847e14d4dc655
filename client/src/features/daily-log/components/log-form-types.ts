import type { UseFormReturnType } from '@mantine/form';
import type { LogValues } from '../utils/log-values';

export type LogForm = UseFormReturnType<LogValues>;
