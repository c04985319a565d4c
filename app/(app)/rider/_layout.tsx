import { AreaStack } from '@/session/area-stack';

/** The rider's garage and measuring: rider accounts only. */
export default function RiderAreaLayout() {
  return <AreaStack area="rider" />;
}
