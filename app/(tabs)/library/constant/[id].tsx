import { ConstantDetailScreen } from '@/components/screens/library/constant-detail-screen';

/** /library/constant/<id>: one version of a constant, its review and its history. */
export default ConstantDetailScreen;
