import { forwardRef, type InputHTMLAttributes, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';

const BASE =
  'w-full rounded-md border border-line-strong bg-panel px-3 py-2 text-sm text-ink placeholder:text-ink-faint focus:border-fjord-500 focus:outline-none focus:ring-2 focus:ring-fjord-100 aria-[invalid=true]:border-brick-500 disabled:bg-paper';

export const TextInput = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement>>(function TextInput({ className = '', ...rest }, ref) {
  return <input ref={ref} className={`${BASE} ${className}`} {...rest} />;
});

export const SelectInput = forwardRef<HTMLSelectElement, SelectHTMLAttributes<HTMLSelectElement>>(function SelectInput({ className = '', children, ...rest }, ref) {
  return (
    <select ref={ref} className={`${BASE} pr-8 ${className}`} {...rest}>
      {children}
    </select>
  );
});

export const TextArea = forwardRef<HTMLTextAreaElement, TextareaHTMLAttributes<HTMLTextAreaElement>>(function TextArea({ className = '', ...rest }, ref) {
  return <textarea ref={ref} className={`${BASE} min-h-20 ${className}`} {...rest} />;
});
