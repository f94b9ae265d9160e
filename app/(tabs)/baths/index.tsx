import { BathsScreen } from '@/components/screens/baths/baths-screen';

/** /baths: the Baths section's landing screen. */
export default BathsScreen;
