import type { PhotoKind } from '@pondwright/shared';
import { createContext, useContext } from 'react';

export type AddPhotos = (files: readonly File[], kind: PhotoKind, caption: string) => Promise<void>;

/**
 * How a row deep in the form (a delivery's "Ticket photo") adds to the day's photo queue, without
 * threading the queue through every section between the form and the row.
 */
export const PhotoAdderContext = createContext<AddPhotos | null>(null);

export const usePhotoAdder = () => useContext(PhotoAdderContext);
