// The batch's last page when some garments of the filtered queue could not be planned: which
// ones and why, so nobody looks for a sheet that was never printed.
import { Page, Text, View } from '@react-pdf/renderer';
import { FAMILY } from './fonts';
import { INK, s } from './styles';
import type { Translate } from '../i18n/catalog';
import type { PageSize } from '../../shared/cut-sheet-types';

/** A page listing the garments left out of a batch, each with its reason. */
export function SkippedNote({ skipped, size, family = FAMILY, t }: { skipped: string[]; size: PageSize; family?: string | string[]; t: Translate }) {
  return (
    <Page size={size} style={family === FAMILY ? s.page : [s.page, { fontFamily: family }]}>
      <View style={s.header}>
        <Text style={s.title}>{t('sheet.skipped')}</Text>
      </View>
      <Text style={[s.small, { marginBottom: 6, color: INK.soft }]}>{t('sheet.skippedNote')}</Text>
      {skipped.map((line, i) => (
        <Text key={i} style={{ fontSize: 11, marginBottom: 3 }}>
          {`•  ${line}`}
        </Text>
      ))}
    </Page>
  );
}
