import { Alert, Grid, Typography } from 'antd';

const DEFAULT_CAUTION =
  'This report is a planning aid: measure the vehicle before cutting, welding or ordering parts, and follow local codes, emissions and registration rules and licensed practice.';

export type ReportCautionProps = { caution?: string; safety?: string[] };

function SafetyList({ safety }: { safety: string[] }) {
  return (
    <ul style={{ margin: 0, paddingLeft: 20 }}>
      {safety.map((s) => (
        <li key={s}>
          <Typography.Text style={{ fontSize: 13 }}>{s}</Typography.Text>
        </li>
      ))}
    </ul>
  );
}

/**
 * The planning-aid caution and the work-safety notes every fit report carries. On a phone the notes fold under one
 * line that says how many there are, so the caution does not fill the first screen; they open with a tap.
 */
export function ReportCaution({ caution, safety }: ReportCautionProps) {
  const phone = Grid.useBreakpoint().md === false;
  const notes = safety ?? [];
  return (
    <Alert
      className="fit-caution"
      type="warning"
      showIcon
      data-testid="fit-caution"
      title="Planning aid: measure before you cut or order"
      description={
        <>
          <Typography.Paragraph style={{ marginBottom: notes.length ? 8 : 0 }}>{caution || DEFAULT_CAUTION}</Typography.Paragraph>
          {notes.length > 0 &&
            (phone ? (
              <details data-testid="fit-safety-notes">
                <summary style={{ cursor: 'pointer', fontWeight: 600, minHeight: 32, lineHeight: '32px' }}>
                  Work-safety notes for this job ({notes.length})
                </summary>
                <SafetyList safety={notes} />
              </details>
            ) : (
              <SafetyList safety={notes} />
            ))}
        </>
      }
    />
  );
}
