import { SafetyScreen } from '@/components/screens/safety/safety-screen';

/** /safety: the Safety section's landing screen. */
export default SafetyScreen;
