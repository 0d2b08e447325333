import type { CautionDto } from '@causeway/shared';
import { Typography } from 'antd';
import { SafetyCaution } from '@/components/safety-caution';

/** The caution component closes with the deferral sentence itself; the catalogue's copy of it is left out. */
function ownPoints(caution: CautionDto): string[] {
  return caution.points.filter((p) => !p.startsWith("Follow the vehicle maker's procedure"));
}

/** The safety cautions of a code's system, each in the amber reserved for them. */
export function CodeCautions({ cautions }: { cautions: CautionDto[] }) {
  if (cautions.length === 0) return null;
  return (
    <>
      {cautions.map((caution) => (
        <SafetyCaution
          key={caution.key}
          title={caution.title}
          points={[
            ...ownPoints(caution),
            ...(caution.sources.length > 0
              ? [
                  <Typography.Text key="sources" type="secondary" style={{ fontSize: 14 }}>
                    Sources: {caution.sources.join('; ')}
                  </Typography.Text>,
                ]
              : []),
          ]}
        />
      ))}
    </>
  );
}
