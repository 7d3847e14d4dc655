import type { EstimateContent, EstimateView } from '@pondwright/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { isApiError, type FieldError } from '@/lib/api-error';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { useFinaliseEstimate } from '../api/finalise-estimate';
import { getEstimateQueryOptions } from '../api/get-estimate';
import { useSaveEstimateDraft } from '../api/save-estimate-draft';

export type EditableContent = Omit<EstimateContent, 'input'>;

const editable = ({ input: _input, ...content }: EstimateContent): EditableContent => content;
const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * The estimator's unsaved edits to one draft: the panel's content, the takeoff input as the workspace
 * last reported it, and the revision they were edited from. Figures always come from the server.
 */
export function useEstimateEditor(estimate: EstimateView) {
  const queryClient = useQueryClient();
  const [baseline, setBaseline] = useState(() => editable(estimate.draft.content));
  const [content, setContent] = useState(baseline);
  const [revision, setRevision] = useState(estimate.draft.revision);
  const [input, setInputState] = useState<unknown>(null);
  const [inputBaseline, setInputBaseline] = useState<unknown>(null);
  /** Bumped when the server's draft is loaded over the edits, so the takeoff form starts again. */
  const [generation, setGeneration] = useState(0);
  const [conflict, setConflict] = useState<{ message: string; details: FieldError[] } | null>(null);
  const [fieldErrors, setFieldErrors] = useState<FieldError[]>([]);
  const save = useSaveEstimateDraft();
  const finalise = useFinaliseEstimate();

  const setInput = useCallback((next: unknown) => {
    setInputState(next);
    setInputBaseline((current: unknown) => current ?? next);
  }, []);

  const adopt = (view: EstimateView) => {
    const next = editable(view.draft.content);
    setBaseline(next);
    setContent(next);
    setRevision(view.draft.revision);
    setFieldErrors([]);
  };

  const saveDraft = () => {
    setFieldErrors([]);
    save.mutate(
      {
        id: estimate.id,
        content: { ...content, input: input ?? estimate.draft.content.input },
        revision,
      },
      {
        onSuccess: (saved) => {
          adopt(saved);
          setInputBaseline(input);
          notifySuccess(`Revision ${saved.draft.revision} saved.`, 'Draft saved');
        },
        onError: (error) => {
          if (isApiError(error, 409)) {
            setConflict({ message: error.message, details: error.details });
            return;
          }
          if (isApiError(error, 400)) setFieldErrors(error.details);
          notifyApiError(error, 'Could not save the draft');
        },
      },
    );
  };

  const reloadServerDraft = async () => {
    const fresh = await queryClient.fetchQuery({
      ...getEstimateQueryOptions(estimate.id),
      staleTime: 0,
    });
    adopt(fresh);
    setInputState(null);
    setInputBaseline(null);
    setConflict(null);
    setGeneration((current) => current + 1);
  };

  const finaliseDraft = (onDone: () => void) => {
    finalise.mutate(
      { id: estimate.id, revision },
      {
        onSuccess: (view) => {
          notifySuccess(
            `Version ${view.versions.at(-1)?.versionNumber ?? ''} created.`,
            'Finalised',
          );
          onDone();
        },
        onError: (error) => {
          if (isApiError(error, 409) && error.details.length > 0) {
            setConflict({ message: error.message, details: error.details });
          }
        },
      },
    );
  };

  const inputDirty = inputBaseline !== null && !same(input, inputBaseline);
  return {
    content,
    setContent,
    revision,
    setInput,
    generation,
    dirty: inputDirty || !same(content, baseline),
    saveDraft,
    saving: save.isPending,
    fieldErrors,
    conflict,
    keepEditing: () => setConflict(null),
    reloadServerDraft,
    finaliseDraft,
    finalising: finalise.isPending,
    finaliseError: finalise.error,
  };
}

export type EstimateEditor = ReturnType<typeof useEstimateEditor>;
