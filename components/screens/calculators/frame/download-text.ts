import { Share } from 'react-native';

/** Hands a text file (CSV) to the system share sheet, where it can be saved or sent. */
export function downloadText(file: { filename: string; text: string }, _type = 'text/csv'): void {
  void Share.share({ title: file.filename, message: file.text });
}
