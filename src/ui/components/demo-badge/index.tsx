/** The mark on every screen that shows the invented demo study. */
import './style.css';
export type DemoBadgeProps = { readonly compact?: boolean };

export function DemoBadge({ compact }: DemoBadgeProps) {
  return <p class={compact ? 'demo-badge compact' : 'demo-badge'}>Invented demo data: not a real trial</p>;
}
