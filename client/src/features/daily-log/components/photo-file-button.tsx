import { Button, type ButtonProps } from '@mantine/core';
import { useRef, type ReactNode } from 'react';

type PhotoFileButtonProps = ButtonProps & {
  children: ReactNode;
  /** Names the hidden file input, for screen readers and tests. */
  inputLabel: string;
  /** Opens the back camera straight away rather than the photo library. */
  camera?: boolean;
  multiple?: boolean;
  onFiles: (files: File[]) => void;
};

/** A button in front of a hidden file input: the phone's own camera or library does the choosing. */
export function PhotoFileButton(props: PhotoFileButtonProps) {
  const { children, inputLabel, camera = false, multiple = false, onFiles, ...button } = props;
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <Button {...button} onClick={() => input.current?.click()}>
        {children}
      </Button>
      <input
        ref={input}
        type="file"
        accept="image/*"
        capture={camera ? 'environment' : undefined}
        multiple={multiple}
        hidden
        aria-label={inputLabel}
        onChange={(event) => {
          const files = [...(event.currentTarget.files ?? [])];
          // The same file chosen again (after a refusal) must fire another change.
          event.currentTarget.value = '';
          if (files.length > 0) onFiles(files);
        }}
      />
    </>
  );
}
