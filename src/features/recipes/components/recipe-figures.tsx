import type { VersionSummary } from '../../../../shared/schemas/recipes';
import { Stat } from '../../../components/ui/stat';
import { formatKcal, formatMacroG, formatProteinDensity } from '../../../lib/format';

/** The headline figures of one version, per serving. */
export function RecipeFigures({ version, servings, versionCount }: { version: VersionSummary | null; servings: number; versionCount: number }) {
  const per = version?.perServing;
  return (
    <dl className="grid grid-cols-2 gap-3 md:grid-cols-4">
      <Stat label="Energy" value={per ? formatKcal(per.kcal) : '—'} note="per serving, newest version" />
      <Stat
        label="Protein"
        value={per ? formatMacroG(per.proteinG) : '—'}
        note={per && per.kcal > 0 ? formatProteinDensity((per.proteinG / per.kcal) * 100) : 'per serving'}
      />
      <Stat
        label="Servings"
        value={servings}
        note={version && version.servings !== servings ? `newest version: ${version.servings}` : 'plates the recipe makes'}
      />
      <Stat label="Versions" value={versionCount} note="saved so far" />
    </dl>
  );
}
