import { ThresholdsScreen } from '@/components/screens/safety/thresholds-screen';

/** /safety/thresholds: the hazard thresholds in force, their history, and (safety role) the form to change them. */
export default ThresholdsScreen;
