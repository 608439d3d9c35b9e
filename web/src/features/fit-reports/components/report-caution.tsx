import { Alert, Typography } from 'antd';

const DEFAULT_CAUTION =
  'This report is a planning aid: measure the vehicle before cutting, welding or ordering parts, and follow local codes, emissions and registration rules and licensed practice.';

export type ReportCautionProps = { caution?: string; safety?: string[] };

/** The planning-aid caution and the work-safety notes every fit report carries. */
export function ReportCaution({ caution, safety }: ReportCautionProps) {
  return (
    <Alert
      className="fit-caution"
      type="warning"
      showIcon
      data-testid="fit-caution"
      title="Planning aid: measure before you cut or order"
      description={
        <>
          <Typography.Paragraph style={{ marginBottom: safety?.length ? 8 : 0 }}>{caution || DEFAULT_CAUTION}</Typography.Paragraph>
          {safety && safety.length > 0 && (
            <ul style={{ margin: 0, paddingLeft: 20 }}>
              {safety.map((s) => (
                <li key={s}>
                  <Typography.Text style={{ fontSize: 13 }}>{s}</Typography.Text>
                </li>
              ))}
            </ul>
          )}
        </>
      }
    />
  );
}
