import { LABOR_TASK_LABELS } from '@pondwright/shared/pricing';
import { describe, expect, it } from 'vitest';
import { TASK_LABELS } from './labels';

describe('task labels', () => {
  it('are the words the office’s prices and cost report use', () => {
    expect(TASK_LABELS).toEqual(LABOR_TASK_LABELS);
  });
});
