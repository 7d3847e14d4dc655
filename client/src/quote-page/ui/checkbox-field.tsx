import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from 'react';

type CheckboxFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> & {
  label: ReactNode;
  error?: ReactNode;
  ref?: Ref<HTMLInputElement>;
};

/** A checkbox with its label beside it (the whole label is the tap target) and its error below. */
export function CheckboxField({ label, error, ref, ...input }: CheckboxFieldProps) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className="qp-check-field">
      <label className="qp-check" htmlFor={id}>
        <input
          ref={ref}
          type="checkbox"
          id={id}
          className="qp-check-box"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          {...input}
        />
        <span className="qp-check-label">{label}</span>
      </label>
      {error && (
        <p className="qp-error qp-check-error" id={errorId}>
          {error}
        </p>
      )}
    </div>
  );
}
