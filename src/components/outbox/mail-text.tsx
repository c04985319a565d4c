import { ThemedText } from '@/components/ui/themed-text';
import { TextLink } from '@/components/ui/text-link';

/** Web addresses in plain text; a trailing full stop or bracket belongs to the sentence. */
const URL_PATTERN = /(https?:\/\/[^\s<>"]*[^\s<>".,;:!?)\]'])/;

/** A mail's plain text with its line breaks kept and its web addresses made into links. */
export function MailText({ text }: { text: string }) {
  // Splitting on a pattern with one capturing group puts the addresses at the odd indexes.
  const parts = text.split(URL_PATTERN);
  return (
    <ThemedText selectable testID="mail-text">
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <TextLink key={index} href={part} external>
            {part}
          </TextLink>
        ) : (
          part
        ),
      )}
    </ThemedText>
  );
}
