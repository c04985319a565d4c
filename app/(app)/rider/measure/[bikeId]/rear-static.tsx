import { ReadingStep } from '@/components/flow/reading-step';

export default function RearStaticStep() {
  return <ReadingStep end="rear" stage="static" />;
}
