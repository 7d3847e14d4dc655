import type { EstimateContent, EstimateView } from '@pondwright/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { isApiError, type FieldError } from '@/lib/api-error';
import { notifyApiError, notifyError, notifySuccess } from '@/lib/notify';
import { useFinaliseEstimate } from '../api/finalise-estimate';
import { getEstimateQueryOptions } from '../api/get-estimate';
import { estimateKeys } from '../api/get-estimates';
import { useSaveEstimateDraft } from '../api/save-estimate-draft';

export type EditableContent = Omit<EstimateContent, 'input'>;

const editable = ({ input: _input, ...content }: EstimateContent): EditableContent => content;
const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The server refuses any change to an accepted estimate (409 ESTIMATE_LOCKED). */
export const isLocked = (estimate: Pick<EstimateView, 'status'>) => estimate.status === 'accepted';
/** A link is out with the homeowner; saving the draft withdraws it (the server revokes it). */
export const hasLinkOut = (estimate: Pick<EstimateView, 'status'>) =>
  estimate.status === 'sent' || estimate.status === 'viewed';

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

  const locked = isLocked(estimate);

  /** The homeowner accepted while this page was open: say so and show the locked estimate. */
  const handleLocked = (error: unknown): boolean => {
    if (!isApiError(error, 409) || error.code !== 'ESTIMATE_LOCKED') return false;
    notifyError(error.message, 'This estimate is locked');
    void queryClient.invalidateQueries({ queryKey: estimateKeys.detail(estimate.id) });
    return true;
  };

  const saveDraft = () => {
    if (locked) return;
    const withdrawsLink = hasLinkOut(estimate);
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
          notifySuccess(
            withdrawsLink
              ? `Revision ${saved.draft.revision} saved. The link sent to the homeowner no longer works; send the quote again when the new version is ready.`
              : `Revision ${saved.draft.revision} saved.`,
            'Draft saved',
          );
          // The server revoked the homeowner's link on this save.
          if (withdrawsLink) {
            void queryClient.invalidateQueries({ queryKey: estimateKeys.quote(estimate.id) });
          }
        },
        onError: (error) => {
          if (handleLocked(error)) return;
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
          if (handleLocked(error)) {
            onDone();
            return;
          }
          if (isApiError(error, 409) && error.details.length > 0) {
            setConflict({ message: error.message, details: error.details });
          }
        },
      },
    );
  };

  const inputDirty = inputBaseline !== null && !same(input, inputBaseline);
  return {
    /** Accepted: nothing may change, and the controls say so. */
    locked,
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
