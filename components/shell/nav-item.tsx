import { Pressable, StyleSheet, View, type PressableStateCallbackType } from 'react-native';
import { TabTrigger, type TabTriggerSlotProps } from 'expo-router/ui';

import { TABS, type TabSpec } from '@/components/shell/tabs';
import { radius, space } from '@/components/theme/tokens';
import { useTheme } from '@/components/theme/use-theme';
import { ThemedText } from '@/components/ui/themed-text';
import { useFocusVisible } from '@/components/ui/use-focus-visible';

/** Where a nav item sits: in the wide side rail or the phone bottom bar. */
export type NavVariant = 'rail' | 'bar';

type Props = TabTriggerSlotProps & { tab: TabSpec; variant: NavVariant };
type WebPressState = PressableStateCallbackType & { hovered?: boolean };

/** One tab button; TabTrigger (asChild) hands it isFocused, onPress and the href. */
export function NavItem({ tab, variant, isFocused = false, onPress, onLongPress, href, ref }: Props) {
  const { palette } = useTheme();
  const focus = useFocusVisible();
  const rail = variant === 'rail';
  const activeColor = rail ? palette.onRail : palette.primary;
  const color = isFocused ? activeColor : rail ? palette.onRailMuted : palette.textMuted;
  const webLink = href ? { href } : {};
  const { Icon } = tab;

  return (
    <Pressable
      {...webLink}
      ref={ref}
      onPress={onPress}
      onLongPress={onLongPress}
      onFocus={focus.onFocus}
      onBlur={focus.onBlur}
      accessibilityRole="tab"
      accessibilityState={{ selected: isFocused }}
      aria-selected={isFocused}
      accessibilityLabel={tab.label}
      accessibilityHint={tab.hint}
      testID={`nav-${variant}-${tab.name}`}
      style={(state: WebPressState) => [
        rail ? styles.railItem : styles.barItem,
        (state.hovered || state.pressed) && !isFocused && {
          backgroundColor: rail ? palette.railHover : palette.surfaceRaised,
        },
        rail && isFocused && { backgroundColor: palette.railActive },
        focus.ring(rail ? palette.onRail : palette.primary, -2),
      ]}
    >
      <View
        style={[
          rail ? styles.railIndicator : styles.barIndicator,
          { backgroundColor: isFocused ? (rail ? palette.accent : palette.primary) : 'transparent' },
        ]}
      />
      <View style={!rail && [styles.iconWrap, isFocused && { backgroundColor: palette.primarySoft }]}>
        <Icon color={color} size={rail ? 20 : 22} />
      </View>
      <ThemedText
        variant={rail ? 'label' : 'caption'}
        weight={isFocused ? 'bold' : rail ? 'regular' : 'semibold'}
        style={[{ color }, !rail && styles.barLabel]}
        numberOfLines={1}
      >
        {tab.label}
      </ThemedText>
    </Pressable>
  );
}

/** The five sections as tab triggers, for the rail or the bar. */
export function NavItems({ variant }: { variant: NavVariant }) {
  return TABS.map((tab) => (
    <TabTrigger key={tab.name} name={tab.name} href={tab.href} asChild>
      <NavItem tab={tab} variant={variant} />
    </TabTrigger>
  ));
}

const styles = StyleSheet.create({
  railItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.sm + space.xxs,
    paddingLeft: space.lg,
    paddingRight: space.md,
    borderRadius: radius.md,
    overflow: 'hidden',
  },
  railIndicator: {
    position: 'absolute',
    left: 0,
    top: space.sm,
    bottom: space.sm,
    width: 4,
    borderRadius: radius.sm,
  },
  barItem: {
    flex: 1,
    alignItems: 'center',
    gap: space.xxs,
    paddingTop: space.sm,
    paddingBottom: space.xs,
    minHeight: 56,
  },
  barIndicator: {
    position: 'absolute',
    top: 0,
    width: 32,
    height: 3,
    borderBottomLeftRadius: radius.sm,
    borderBottomRightRadius: radius.sm,
  },
  iconWrap: {
    paddingHorizontal: space.md,
    paddingVertical: space.xxs,
    borderRadius: radius.pill,
  },
  barLabel: { textAlign: 'center' },
});
