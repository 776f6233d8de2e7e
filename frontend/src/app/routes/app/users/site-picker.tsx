import type { RenderSitePicker } from '@/features/users/components/site-picker-slot';
import { SitePicker } from '@/features/sites/components/site-picker';

/** The sites feature's picker, handed to the users feature's forms. */
export const renderSitePicker: RenderSitePicker = (props) => <SitePicker {...props} />;
