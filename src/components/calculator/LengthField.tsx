import type { ReactNode } from 'react';
import { LengthInput, type InputBinding } from '@/components/LengthInput';
import type { LengthField as Field } from './calculator-values';

/** What a field shows besides its error: the reading of what was typed, and a note. */
export type FieldInfo = (f: Field) => { reading: string | null; note: string | null };

/** Ties one length input to the calculator's state: its value and what typing does. */
export type Bind = (f: Field) => InputBinding;

interface Props {
  name: Field;
  label: string;
  unit: string;
  bind: Bind;
  hint?: ReactNode;
  error?: string;
  children?: ReactNode;
  info: FieldInfo;
}

/** One of the calculator's length inputs, by its field name. */
export function LengthField({ name, bind, info, ...rest }: Props) {
  return <LengthInput id={`f-${name}`} registration={bind(name)} {...info(name)} {...rest} />;
}
