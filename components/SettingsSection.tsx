import type { ReactNode } from 'react';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type SettingsSectionProps = { title: string; description?: string; children: ReactNode };

/** One titled group of settings. */
export function SettingsSection({ title, description, children }: SettingsSectionProps) {
  return (
    <Card style={{ gap: space.lg }}>
      <AppText variant="heading">{title}</AppText>
      {description ? <AppText tone="muted">{description}</AppText> : null}
      {children}
    </Card>
  );
}
