import { StyleSheet, Text, View } from 'react-native';
import { colors, fonts, ScreenFrame, space, useBreakpoint } from '../../ui';
import { ClosedBoxCalculator } from '../components/closed-box-calculator';
import { LevelConversions } from '../components/level-conversions';
import { ParameterCompletion } from '../components/parameter-completion';
import { VentedBoxCalculator } from '../components/vented-box-calculator';

export function ToolsScreen() {
  const wide = useBreakpoint() === 'wide';
  const header = (
    <View style={styles.header}>
      <Text style={styles.h1} accessibilityRole="header">Tools</Text>
      <Text style={styles.lede}>
        Box volumes, parameter completion and level conversions. Type in the units on the spec sheet; results update as you type.
      </Text>
    </View>
  );
  if (wide) {
    // Box calculators share the left column so the tall parameter form has the right one to itself.
    return (
      <ScreenFrame testID="tools-screen">
        {header}
        <View style={styles.columns} testID="tools-columns">
          <View style={styles.column}>
            <ClosedBoxCalculator />
            <VentedBoxCalculator />
            <LevelConversions />
          </View>
          <View style={styles.column}>
            <ParameterCompletion />
          </View>
        </View>
      </ScreenFrame>
    );
  }
  return (
    <ScreenFrame testID="tools-screen">
      {header}
      <ClosedBoxCalculator />
      <VentedBoxCalculator />
      <ParameterCompletion />
      <LevelConversions />
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  lede: { fontFamily: fonts.regular, fontSize: 15, color: colors.inkSoft },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  column: { flex: 1, minWidth: 0, gap: space.lg },
});
