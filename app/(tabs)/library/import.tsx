import { ImportScreen } from '@/components/screens/library/import-screen';

/** /library/import: bring constants in from a CSV file as drafts for review (chemists). */
export default ImportScreen;
