import { MakeUpScreen } from '@/components/screens/calculators/make-up/make-up-screen';

/** /calculate/make-up: salt to add to reach a free ligand level or a headroom (?bath=<id> to start from a bath). */
export default MakeUpScreen;
