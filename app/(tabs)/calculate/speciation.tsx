import { SpeciationScreen } from '@/components/screens/calculators/speciation/speciation-screen';

/** /calculate/speciation: where each metal and ligand sits (?bath=<id> to start from a bath). */
export default SpeciationScreen;
