import { ReadingStep } from '@/components/flow/reading-step';

export default function RearRiderStep() {
  return <ReadingStep end="rear" stage="rider" />;
}
