import { BathDetailScreen } from '@/components/screens/bath-detail/bath-detail-screen';

/** /baths/<id>: one bath's record, trends, analysis log and attachments. */
export default BathDetailScreen;
