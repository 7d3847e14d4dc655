import { useId, type ReactNode, type Ref } from 'react';

type AlertProps = {
  title: string;
  /** red for errors, clay for warnings that are not errors, reed for good news, stone for neutral. */
  tone?: 'red' | 'clay' | 'reed' | 'stone';
  /** `alert` for errors, `status` for news the homeowner waits for. */
  role: 'alert' | 'status';
  icon?: ReactNode;
  children: ReactNode;
  tabIndex?: number;
  ref?: Ref<HTMLDivElement>;
};

/** A notice in a pale band of its tone's colour, named by its title. */
export function Alert({ title, tone = 'reed', role, icon, children, tabIndex, ref }: AlertProps) {
  const titleId = useId();
  return (
    <div
      ref={ref}
      role={role}
      tabIndex={tabIndex}
      className="qp-alert"
      data-tone={tone}
      aria-labelledby={titleId}
    >
      {icon && <div className="qp-alert-icon">{icon}</div>}
      <div className="qp-alert-body">
        <p className="qp-alert-title" id={titleId}>
          {title}
        </p>
        {children}
      </div>
    </div>
  );
}
