import { SystemScreen } from '@/components/screens/calculate/system-screen';

/** /calculate/system: speciation worked out from the constants library. */
export default SystemScreen;
