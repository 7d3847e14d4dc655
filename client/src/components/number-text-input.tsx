import { TextInput, type TextInputProps } from '@mantine/core';
import { useEffect, useState } from 'react';

/** Reads typed text as a number only when it is one, so "1." or "abc" reach the schema as text. */
export function parseNumberText(text: string): number | string | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  return /^-?\d+(\.\d+)?$/.test(trimmed) ? Number(trimmed) : trimmed;
}

type NumberTextInputProps = Omit<TextInputProps, 'value' | 'onChange'> & {
  value: number | string | undefined;
  onChange: (value: number | string | undefined) => void;
};

/**
 * A text input for a number held as a number: it keeps what was typed ("2.", "abc") on
 * screen while handing the schema either a number or the text to reject.
 */
export function NumberTextInput({ value, onChange, ...props }: NumberTextInputProps) {
  const [text, setText] = useState(value === undefined ? '' : String(value));
  // A change from outside (discarding a draft, deleting a row above) replaces the typed text.
  useEffect(() => {
    setText((current) => (parseNumberText(current) === value ? current : String(value ?? '')));
  }, [value]);
  return (
    <TextInput
      inputMode="decimal"
      {...props}
      value={text}
      onChange={(event) => {
        setText(event.currentTarget.value);
        onChange(parseNumberText(event.currentTarget.value));
      }}
    />
  );
}
