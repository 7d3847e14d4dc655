import { Center, Image, Skeleton, Text } from '@mantine/core';
import { IconPhotoOff } from '@tabler/icons-react';
import { usePhotoImage } from '../api/get-photo-image';
import { useObjectUrl } from '../hooks/use-object-url';

type PhotoImageProps = {
  /** The API path of the image or thumbnail; it needs the bearer token, so it is fetched first. */
  path: string;
  alt: string;
  height: number | string;
  fit?: 'cover' | 'contain';
};

/** A job photo fetched with the bearer token and shown through an object URL (freed on unmount). */
export function PhotoImage({ path, alt, height, fit = 'cover' }: PhotoImageProps) {
  const image = usePhotoImage(path);
  const url = useObjectUrl(image.data);
  if (image.isError) {
    return (
      <Center h={height} bg="var(--mantine-color-default-hover)" c="dimmed" style={{ gap: 6 }}>
        <IconPhotoOff size={18} aria-hidden />
        <Text size="xs">The photo could not be loaded.</Text>
      </Center>
    );
  }
  if (!url) return <Skeleton h={height} aria-label={`Loading ${alt}`} />;
  return <Image src={url} alt={alt} h={height} w="100%" fit={fit} radius="sm" />;
}
