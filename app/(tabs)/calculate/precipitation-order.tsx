import { PrecipitationOrderScreen } from '@/components/screens/calculators/precipitation-order/precipitation-screen';

/** /calculate/precipitation-order: the order metals come out as a precipitant is dosed (?bath=<id> to start from a bath). */
export default PrecipitationOrderScreen;
