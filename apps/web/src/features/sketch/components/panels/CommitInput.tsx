import { Input, type InputProps } from '@fluentui/react-components';
import { useEffect, useState } from 'react';

export interface CommitInputProps extends Omit<InputProps, 'value' | 'onChange' | 'defaultValue' | 'onError'> {
  value: string;
  /** Called on Enter or blur when the text changed; return an error message to refuse it. */
  onCommit(text: string): string | void;
  onError?(message: string | null): void;
}

/** A text field that turns into one command when the user finishes (Enter or leaving the field), not per key. */
export function CommitInput({ value, onCommit, onError, ...rest }: CommitInputProps) {
  const [text, setText] = useState(value);
  useEffect(() => setText(value), [value]);
  const commit = () => {
    if (text === value) return;
    const error = onCommit(text);
    onError?.(error ?? null);
    if (error) setText(value);
  };
  return (
    <Input
      {...rest}
      value={text}
      onChange={(_, data) => setText(data.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') setText(value);
      }}
    />
  );
}
