import { CurvesScreen } from '@/components/screens/calculators/curves/curves-screen';

/** /calculate/curves: one input swept over a range, drawn as charts (?bath=<id> to start from a bath). */
export default CurvesScreen;
