import { withLanguage } from '@/components/I18n';
import { CalculatorForm } from './CalculatorForm';

/** The hem-and-cuff calculator island: the form and the plan, on plain React state (no query client: the page stays light), in the page's language. */
export default withLanguage(CalculatorForm);
