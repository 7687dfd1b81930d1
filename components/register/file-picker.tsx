import { Notice } from '@/components/ui/notice';

/** Native builds: importing a spreadsheet is a desk task, done in the web app. */
export function FilePicker(_props: { label: string; onFile: (file: File) => void; busy?: boolean; testID?: string }) {
  return <Notice tone="info" word="Web app only">Importing a CSV file is available in the Isoledger web app.</Notice>;
}

export const filePickerAvailable = false;
