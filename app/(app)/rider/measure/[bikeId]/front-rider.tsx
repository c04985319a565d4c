import { ReadingStep } from '@/components/flow/reading-step';

export default function FrontRiderStep() {
  return <ReadingStep end="front" stage="rider" />;
}
