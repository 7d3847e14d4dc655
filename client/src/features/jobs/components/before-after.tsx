import { Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { PhotoView } from '@pondwright/shared';
import { useState } from 'react';
import { photoCredit, photoName } from '../utils/photo-text';
import { PhotoImage } from './photo-image';
import { PhotoThumbnail } from './photo-thumbnail';

function Side({
  title,
  photos,
  chosenId,
  onChoose,
  empty,
}: {
  title: string;
  photos: PhotoView[];
  chosenId: string | undefined;
  onChoose: (id: string) => void;
  empty: string;
}) {
  const chosen = photos.find((photo) => photo.id === chosenId) ?? photos[0];
  return (
    <Stack gap="xs" component="section" aria-label={title}>
      <Title order={3} fz="h5">
        {title}
      </Title>
      {chosen ? (
        <>
          <PhotoImage path={chosen.imagePath} alt={photoName(chosen)} height={360} fit="contain" />
          <Text size="xs" c="dimmed">
            {chosen.caption ? `${chosen.caption} · ` : ''}
            {photoCredit(chosen)}
          </Text>
          {photos.length > 1 && (
            <Group gap="xs">
              {photos.map((photo) => (
                <div key={photo.id} style={{ width: 72 }}>
                  <PhotoThumbnail
                    photo={photo}
                    height={54}
                    withCaption={false}
                    selected={photo.id === chosen.id}
                    onOpen={() => onChoose(photo.id)}
                  />
                </div>
              ))}
            </Group>
          )}
        </>
      ) : (
        <Text size="sm" c="dimmed">
          {empty}
        </Text>
      )}
    </Stack>
  );
}

/**
 * The site before the work beside the finished pond, side by side; by default the first "before"
 * and the latest "after", and any other of each can be chosen from the strip below it.
 */
export function BeforeAfter({ photos }: { photos: PhotoView[] }) {
  const before = photos.filter((photo) => photo.kind === 'before');
  const after = photos.filter((photo) => photo.kind === 'after').reverse();
  const [beforeId, setBeforeId] = useState<string>();
  const [afterId, setAfterId] = useState<string>();
  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
      <Side
        title="Before"
        photos={before}
        chosenId={beforeId}
        onChoose={setBeforeId}
        empty="No before photos yet."
      />
      <Side
        title="After"
        photos={after}
        chosenId={afterId}
        onChoose={setAfterId}
        empty="No after photos yet."
      />
    </SimpleGrid>
  );
}
