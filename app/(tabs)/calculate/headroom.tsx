import { HeadroomScreen } from '@/components/screens/calculators/headroom/headroom-screen';

/** /calculate/headroom: how much more of a solid a bath takes before a solid persists (?bath=<id> to start from a bath). */
export default HeadroomScreen;
