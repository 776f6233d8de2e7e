import type { ReactNode } from 'react';
import type { SiteSummary } from '@shared/schemas/auth.schema';

/** What a user form hands to the site picker the page gives it. */
export interface SitePickerSlotProps {
  value: string[];
  onChange: (siteIds: string[]) => void;
  error?: string;
  disabled?: boolean;
  extraSites?: SiteSummary[];
}

export type RenderSitePicker = (props: SitePickerSlotProps) => ReactNode;
