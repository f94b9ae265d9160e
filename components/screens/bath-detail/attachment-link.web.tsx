import { space, type } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { type AttachmentLinkProps } from '@/components/screens/bath-detail/attachment-link';

/**
 * Download on the web: a real anchor to the same-origin file (the browser sends the session cookie),
 * so it works with the keyboard, middle click and "save link as".
 */
export function AttachmentLink({ path, fileName, title }: AttachmentLinkProps) {
  const { palette, typeface } = useTheme();
  return (
    <a
      href={path}
      download={fileName}
      rel="noopener"
      aria-label={`Download ${title}`}
      style={{
        // NOTE: a DOM element takes CSS, not React Native styles: line height in px, text-decoration.
        fontSize: type.label.fontSize,
        lineHeight: `${type.label.lineHeight}px`,
        ...typeface('semibold'),
        color: palette.primary,
        textDecoration: 'underline',
        alignSelf: 'flex-start',
        padding: `${space.xxs}px 0`,
      }}
    >
      Download
    </a>
  );
}
