import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type Ref,
  type TextareaHTMLAttributes,
} from 'react';

type FieldProps = {
  label: string;
  /** Shown under the label; read out after it. */
  hint?: ReactNode;
  error?: ReactNode;
  required?: boolean;
};

type ControlProps = {
  id: string;
  className: string;
  required?: boolean;
  'aria-invalid'?: true;
  'aria-describedby'?: string;
};

/** Label, hint, the control, then its error; the control is described by the error and the hint. */
function Field({
  label,
  hint,
  error,
  required,
  control,
}: FieldProps & { control: (props: ControlProps) => ReactNode }) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [error ? errorId : null, hint ? hintId : null].filter(Boolean).join(' ');
  return (
    <div className="qp-field">
      <label className="qp-label" htmlFor={id}>
        {label}
        {required && (
          <span className="qp-required" aria-hidden="true">
            {' '}
            *
          </span>
        )}
      </label>
      {hint && (
        <p className="qp-hint" id={hintId}>
          {hint}
        </p>
      )}
      {control({
        id,
        className: 'qp-input',
        required,
        'aria-invalid': error ? true : undefined,
        'aria-describedby': describedBy || undefined,
      })}
      {error && (
        <p className="qp-error" id={errorId}>
          {error}
        </p>
      )}
    </div>
  );
}

type TextFieldProps = FieldProps &
  Omit<InputHTMLAttributes<HTMLInputElement>, 'required'> & { ref?: Ref<HTMLInputElement> };

export function TextField({ label, hint, error, required, ref, ...input }: TextFieldProps) {
  return (
    <Field
      label={label}
      hint={hint}
      error={error}
      required={required}
      control={(props) => <input ref={ref} type="text" {...input} {...props} />}
    />
  );
}

type TextAreaFieldProps = FieldProps &
  Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'required'> & {
    ref?: Ref<HTMLTextAreaElement>;
  };

export function TextAreaField({ label, hint, error, required, ref, ...input }: TextAreaFieldProps) {
  return (
    <Field
      label={label}
      hint={hint}
      error={error}
      required={required}
      control={(props) => <textarea ref={ref} {...input} {...props} />}
    />
  );
}
