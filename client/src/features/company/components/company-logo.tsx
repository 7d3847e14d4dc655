import {
  Button,
  Center,
  FileInput,
  Group,
  Image,
  Loader,
  Paper,
  Stack,
  Text,
  Title,
} from '@mantine/core';
import type { CompanyProfile } from '@pondwright/shared';
import { IconPhoto, IconTrash, IconUpload } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { errorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import {
  LOGO_MAX_BYTES,
  LOGO_TYPES,
  useCompanyLogo,
  useRemoveCompanyLogo,
  useUploadCompanyLogo,
} from '../api/company-logo';

const kilobytes = (bytes: number) => `${Math.ceil(bytes / 1024)} KB`;

/** Why a file cannot be the logo, checked before it is sent; null when it may go. */
export function logoFileProblem(file: File): string | null {
  const typeOk =
    (LOGO_TYPES as readonly string[]).includes(file.type) ||
    (file.type === '' && /\.(png|jpe?g)$/i.test(file.name));
  if (!typeOk) return `“${file.name}” is not a PNG or JPEG image. Choose a .png or .jpg file.`;
  if (file.size > LOGO_MAX_BYTES) {
    return `“${file.name}” is ${kilobytes(file.size)}; the logo can be at most ${kilobytes(LOGO_MAX_BYTES)}. Try a smaller image, or save it as a JPEG.`;
  }
  return null;
}

/** The current logo, fetched with the bearer token and shown through an object URL. */
function LogoPreview({ companyName }: { companyName: string }) {
  const logo = useCompanyLogo(true);
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    if (!logo.data) return;
    const next = URL.createObjectURL(logo.data);
    setUrl(next);
    return () => URL.revokeObjectURL(next);
  }, [logo.data]);

  return (
    <Paper withBorder p="sm" w="fit-content" miw={160} mih={96}>
      {logo.isError ? (
        <Text size="sm" c="red">
          The logo could not be loaded. {errorMessage(logo.error)}
        </Text>
      ) : url ? (
        <Image src={url} alt={`${companyName} logo`} h={80} w="auto" maw={320} fit="contain" />
      ) : (
        <Center h={80}>
          <Loader size="sm" aria-label="Loading the logo" />
        </Center>
      )}
    </Paper>
  );
}

/** The owner's logo for quotes: upload a PNG or JPEG (at most 512 KB), see it, or remove it. */
export function CompanyLogo({ company }: { company: Pick<CompanyProfile, 'name' | 'hasLogo'> }) {
  const upload = useUploadCompanyLogo();
  const remove = useRemoveCompanyLogo();
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [confirming, setConfirming] = useState(false);

  const choose = (chosen: File | null) => {
    setFile(chosen);
    setProblem(null);
    if (!chosen) return;
    const reason = logoFileProblem(chosen);
    if (reason) {
      setProblem(reason);
      return;
    }
    upload.mutate(chosen, {
      onSuccess: () => {
        setFile(null);
        notifySuccess('Your quotes now show this logo.', 'Logo uploaded');
      },
      onError: (error) => setProblem(errorMessage(error)),
    });
  };

  return (
    <Stack gap="md" component="section" aria-labelledby="company-logo-title">
      <div>
        <Title order={2} fz="h4" id="company-logo-title">
          Logo
        </Title>
        <Text size="sm" c="dimmed">
          Shown on your quotes and on the page where homeowners accept them.
        </Text>
      </div>
      {company.hasLogo ? (
        <LogoPreview companyName={company.name} />
      ) : (
        <Group gap="xs" c="dimmed">
          <IconPhoto size={18} aria-hidden />
          <Text size="sm">No logo yet. Quotes show the company name instead.</Text>
        </Group>
      )}
      <FileInput
        label={company.hasLogo ? 'Replace the logo' : 'Upload a logo'}
        description="A PNG or JPEG image, at most 512 KB."
        placeholder="Choose an image"
        accept={LOGO_TYPES.join(',')}
        leftSection={<IconUpload size={16} />}
        rightSection={upload.isPending ? <Loader size="xs" aria-label="Uploading" /> : undefined}
        value={file}
        onChange={choose}
        error={problem}
        disabled={upload.isPending}
        maw={420}
      />
      {company.hasLogo && (
        <Group>
          <Button
            variant="subtle"
            color="red"
            leftSection={<IconTrash size={16} />}
            onClick={() => setConfirming(true)}
          >
            Remove the logo
          </Button>
        </Group>
      )}
      <ConfirmDialog
        opened={confirming}
        title="Remove the logo?"
        confirmLabel="Remove"
        confirmColor="red"
        loading={remove.isPending}
        error={remove.error}
        onCancel={() => {
          setConfirming(false);
          remove.reset();
        }}
        onConfirm={() =>
          remove.mutate(undefined, {
            onSuccess: () => {
              setConfirming(false);
              notifySuccess('Quotes show the company name instead.', 'Logo removed');
            },
          })
        }
      >
        Your quotes, and the page where homeowners accept them, show the company name instead.
      </ConfirmDialog>
    </Stack>
  );
}
