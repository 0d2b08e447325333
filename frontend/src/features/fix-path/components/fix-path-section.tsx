import type { VehicleScopeQuery } from '@causeway/shared';
import { Alert, Skeleton } from 'antd';
import { useCauseRanking } from '../api/get-cause-ranking';
import { useFixPath } from '../api/get-fix-path';
import { CauseRanking } from './cause-ranking';
import { FixPathPanel } from './fix-path-panel';

type FixPathSectionProps = {
  code: string;
  vehicle: VehicleScopeQuery;
  /** Caution keys the page already sets out in full. */
  cautionsShownInFull?: string[];
};

/** The possible causes of a code for the vehicle and the fix path that costs least on average. */
export function FixPathSection({ code, vehicle, cautionsShownInFull }: FixPathSectionProps) {
  const path = useFixPath(code, vehicle);
  const ranking = useCauseRanking(code, vehicle);
  const vehicleKey = JSON.stringify(vehicle);

  return (
    <div style={{ marginTop: 32 }} aria-busy={path.isFetching || ranking.isFetching}>
      {path.isError ? (
        <Alert type="error" showIcon title={`The fix path could not be worked out: ${path.error.message}`} />
      ) : path.data ? (
        // A new vehicle brings new figures: what-if edits start again from them.
        <FixPathPanel key={vehicleKey} dto={path.data} cautionsShownInFull={cautionsShownInFull} />
      ) : (
        <Skeleton active paragraph={{ rows: 6 }} />
      )}
      <div style={{ marginTop: 32 }}>
        {ranking.isError ? (
          <Alert type="error" showIcon title={`The possible causes could not be loaded: ${ranking.error.message}`} />
        ) : ranking.data ? (
          <CauseRanking ranking={ranking.data} />
        ) : (
          <Skeleton active paragraph={{ rows: 4 }} />
        )}
      </div>
    </div>
  );
}
