import { FixerLoadingScreen } from '@/components/screens/calculators/fixer-loading/fixer-loading-screen';

/** /calculate/fixer-loading: silver held by a thiosulfate fixer and the capacity left (?bath=<id> to start from a bath). */
export default FixerLoadingScreen;
