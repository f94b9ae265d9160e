import { ProposeScreen } from '@/components/screens/library/propose-screen';

/** /library/propose: a new constant, sent as a draft for review (chemists). */
export default ProposeScreen;
