import { AreaStack } from '@/session/area-stack';

/** The parts counter's spring catalogue and stock: counter accounts, and the admin. */
export default function CounterAreaLayout() {
  return <AreaStack area="counter" />;
}
