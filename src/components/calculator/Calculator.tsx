import { withQuery } from '@/components/WithQuery';
import { CalculatorForm } from './CalculatorForm';

/** The hem-and-cuff calculator island: the form and the plan, on the page's query client like the other islands. */
export default withQuery(CalculatorForm);
