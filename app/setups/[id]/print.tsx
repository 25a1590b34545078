import { useLocalSearchParams } from 'expo-router';
import type { ReactNode } from 'react';
import { Platform, ScrollView, StyleSheet, View } from 'react-native';
import { Button } from '../../../components/Button';
import { PrintSheet } from '../../../components/PrintSheet';
import { PRINT_IDS, PrintStyles, printPage } from '../../../components/PrintStyles';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { TextLink } from '../../../components/TextLink';
import { ApiRequestError } from '../../../hooks/api';
import { useDisplayUnits } from '../../../hooks/garageUi';
import { useSetupQuery } from '../../../hooks/setups';
import { layout, space, useTheme } from '../../../theme';

/** The page around the sheet: no tab bar here, only a way back and the print button, both left off paper. */
function PrintFrame({ backHref, canPrint, children }: { backHref: string; canPrint: boolean; children: ReactNode }) {
  const { colors } = useTheme();
  return (
    <ScrollView style={{ backgroundColor: colors.background }} contentContainerStyle={styles.scroll}>
      <PrintStyles />
      <View role="main" style={styles.main}>
        <View testID={PRINT_IDS.hide} style={styles.toolbar}>
          <TextLink href={backHref} label="Back to the setup" dismissTo />
          {canPrint && Platform.OS === 'web' ? <Button label="Print" onPress={printPage} /> : null}
        </View>
        {children}
      </View>
    </ScrollView>
  );
}

export default function PrintScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string }>();
  const id = Number(params.id);
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const setup = useSetupQuery(id, share);
  const units = useDisplayUnits();
  const backHref = `/setups/${params.id}${share ? `?share=${encodeURIComponent(share)}` : ''}`;
  let body: ReactNode;
  if (setup.isError && setup.error instanceof ApiRequestError && setup.error.status === 404) {
    body = <EmptyState title="No setup at this address" message="It may be private, deleted, or the link is missing its share code." />;
  } else if (!Number.isSafeInteger(id) || id <= 0) {
    body = <EmptyState title="No setup at this address" message="Check the number in the address." />;
  } else if (setup.isPending) {
    body = <LoadingState label="Loading the pit sheet…" />;
  } else if (setup.isError) {
    body = <ErrorState title="The pit sheet could not load" message={setup.error.message} onRetry={() => void setup.refetch()} />;
  } else {
    body = <PrintSheet setup={setup.data} units={units} />;
  }
  return (
    <PrintFrame backHref={backHref} canPrint={setup.isSuccess}>
      {body}
    </PrintFrame>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, paddingHorizontal: space.lg, paddingVertical: space.lg, gap: space.md },
  toolbar: {
    width: '100%',
    maxWidth: layout.contentMaxWidth * 1.5,
    alignSelf: 'center',
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
  },
  main: { width: '100%', alignSelf: 'center', gap: space.md },
});
