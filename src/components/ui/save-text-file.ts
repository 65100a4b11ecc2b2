import { Share } from 'react-native';

/** Hands a text file to the system share sheet (native apps have no downloads folder to write to). */
export async function saveTextFile(fileName: string, text: string, _mimeType = 'text/csv'): Promise<void> {
  await Share.share({ title: fileName, message: text });
}
