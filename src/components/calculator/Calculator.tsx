import { CalculatorForm } from './CalculatorForm';

/** The hem-and-cuff calculator island: the form and the plan, on plain React state (no query client: the page stays light). */
export default CalculatorForm;
