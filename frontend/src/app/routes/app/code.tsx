import { LeftOutlined } from '@ant-design/icons';
import { parseDtc, type VehicleScopeQuery } from '@causeway/shared';
import { Skeleton } from 'antd';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useCode } from '@/features/codes/api/get-code';
import { CodeDetails } from '@/features/codes/components/code-details';
import { CodeProblem } from '@/features/codes/components/code-problem';
import { codeLookupProblem } from '@/features/codes/utils/code-error';
import { FixPathSection } from '@/features/fix-path/components/fix-path-section';
import { VehiclePicker } from '@/features/fix-path/components/vehicle-picker';
import { parseVehicleParams, withVehicleParams } from '@/features/fix-path/utils/vehicle';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

/** `/codes/:code`: what a code means, its possible causes on the vehicle in the bay, and the fix path. */
export function Component() {
  const { code = '' } = useParams();
  const [searchParams, setSearchParams] = useSearchParams();
  const vehicle = parseVehicleParams(searchParams);
  const user = useCurrentUser();
  const locale = user.shop?.locale ?? browserLocale();
  const entry = useCode(code, vehicle.make);
  const problem = entry.isError ? codeLookupProblem(code, entry.error) : null;
  // The address may hold the code as typed (po456, 04 56); the page speaks of it in normal form.
  const parsed = parseDtc(code);
  const shown = parsed.ok ? parsed.value.display : code;

  const setVehicle = (next: VehicleScopeQuery) => setSearchParams(withVehicleParams(searchParams, next), { replace: true });

  const title = entry.data ? `${shown} · ${entry.data.title}` : problem?.kind === 'invalid' ? 'Not a fault code' : shown;
  return (
    <>
      <Link to={paths.codes} style={{ display: 'inline-flex', alignItems: 'center', gap: 6, minHeight: 44 }}>
        <LeftOutlined aria-hidden /> All fault codes
      </Link>
      <PageHeader title={title} description={entry.data ? entry.data.subsystem : undefined} />
      {problem?.kind !== 'invalid' && <VehiclePicker value={vehicle} onChange={setVehicle} />}
      {entry.isPending ? (
        <Skeleton active paragraph={{ rows: 6 }} />
      ) : problem ? (
        <CodeProblem code={code} problem={problem} make={vehicle.make} />
      ) : entry.data ? (
        <>
          <CodeDetails entry={entry.data} locale={locale} />
          <FixPathSection code={entry.data.structure.display} vehicle={vehicle} cautionsShownInFull={entry.data.cautions.map((c) => c.key)} />
        </>
      ) : null}
    </>
  );
}
