import { DosingPlanScreen } from '@/components/screens/calculators/dosing-plan/dosing-screen';

/** /calculate/dosing-plan: additions, pH set points and dilutions step by step (?bath=<id> to start from a bath). */
export default DosingPlanScreen;
