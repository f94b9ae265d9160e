import { CalculateScreen } from '@/components/screens/calculate/calculate-screen';

/** /calculate: the Calculate section's landing screen. */
export default CalculateScreen;
