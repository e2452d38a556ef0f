import type { ReactNode } from 'react';
import type { UseFormRegister } from 'react-hook-form';
import { LengthInput } from '@/components/LengthInput';
import type { CalculatorValues, LengthField as Field } from './calculator-values';

interface Props {
  name: Field;
  label: string;
  unit: string;
  register: UseFormRegister<CalculatorValues>;
  hint?: ReactNode;
  error?: string;
  children?: ReactNode;
}

/** One of the calculator's length inputs, by its field name. */
export function LengthField({ name, register, ...rest }: Props) {
  return <LengthInput id={`f-${name}`} registration={register(name)} {...rest} />;
}
