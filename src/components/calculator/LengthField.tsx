import type { ReactNode } from 'react';
import type { UseFormRegister } from 'react-hook-form';
import { LengthInput } from '@/components/LengthInput';
import type { CalculatorValues, LengthField as Field } from './calculator-values';

/** What a field shows besides its error: the reading of what was typed, and a note. */
export type FieldInfo = (f: Field) => { reading: string | null; note: string | null };

interface Props {
  name: Field;
  label: string;
  unit: string;
  register: UseFormRegister<CalculatorValues>;
  hint?: ReactNode;
  error?: string;
  children?: ReactNode;
  info: FieldInfo;
}

/** One of the calculator's length inputs, by its field name. */
export function LengthField({ name, register, info, ...rest }: Props) {
  return <LengthInput id={`f-${name}`} registration={register(name)} {...info(name)} {...rest} />;
}
