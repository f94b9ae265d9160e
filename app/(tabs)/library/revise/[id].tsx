import { ReviseScreen } from '@/components/screens/library/revise-screen';

/** /library/revise/<id>: a revision of that version, sent as a draft for review (chemists). */
export default ReviseScreen;
