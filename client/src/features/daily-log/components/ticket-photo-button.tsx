import { IconReceipt } from '@tabler/icons-react';
import { ticketCaption } from '../utils/photo-labels';
import { usePhotoAdder } from './photo-adder';
import { PhotoFileButton } from './photo-file-button';

/** The supplier's ticket, photographed on the delivery's own row, captioned with its number. */
export function TicketPhotoButton({ ticketNumber }: { ticketNumber: string }) {
  const addPhotos = usePhotoAdder();
  if (!addPhotos) return null;
  return (
    <PhotoFileButton
      size="compact-md"
      variant="light"
      camera
      inputLabel="Ticket photo from the camera"
      leftSection={<IconReceipt size={16} />}
      style={{ alignSelf: 'flex-start' }}
      onFiles={(files) => void addPhotos(files, 'ticket', ticketCaption(ticketNumber))}
    >
      Ticket photo
    </PhotoFileButton>
  );
}
