import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { errorMessage } from '@/hooks/api/request';
import { useLabelPdfMutation, type LabelLayout, type LabelPdfSelection } from '@/hooks/api/use-label-pdf';
import { saveFile } from '@/components/ui/save-file';

/** "Print labels" for one item, a plant room, a site or a table selection: downloads the PDF to print. */
export function PrintLabelsButtons({ selection, fileStem, compact }: { selection: LabelPdfSelection; fileStem: string; compact?: boolean }) {
  const pdf = useLabelPdfMutation();
  const print = async (layout: LabelLayout) => {
    const blob = await pdf.mutateAsync({ selection, layout });
    saveFile(blob, `${fileStem}-labels-${layout === 'sheet' ? 'a4' : 'roll-62mm'}.pdf`);
  };
  return (
    <View style={{ gap: space.sm }}>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        <Button title={compact ? 'Labels: A4 sheet' : 'Print labels (A4 sheet of 21)'} variant="secondary" busy={pdf.isPending && pdf.variables?.layout === 'sheet'} onPress={() => void print('sheet').catch(() => {})} testID="print-labels-sheet" />
        <Button title={compact ? 'Labels: 62 mm roll' : 'Print labels (62 mm roll)'} variant="secondary" busy={pdf.isPending && pdf.variables?.layout === 'roll'} onPress={() => void print('roll').catch(() => {})} testID="print-labels-roll" />
      </View>
      {pdf.isError ? <Notice tone="danger" word="Not printed">{errorMessage(pdf.error)}</Notice> : null}
    </View>
  );
}
