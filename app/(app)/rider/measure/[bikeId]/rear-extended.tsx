import { ReadingStep } from '@/components/flow/reading-step';

export default function RearExtendedStep() {
  return <ReadingStep end="rear" stage="extended" />;
}
