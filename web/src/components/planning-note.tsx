import { Typography } from 'antd';

export function PlanningNote() {
  return (
    <Typography.Paragraph type="secondary" style={{ margin: 0, fontSize: 13 }} data-testid="planning-note">
      Swapwright is a planning aid. Measure the vehicle before cutting or ordering. Lifting an engine, supporting a
      vehicle, fuel-system work, frame welding and steering or brake changes can injure people: use rated stands and
      hoists, follow local codes, emissions and registration rules, and leave the work to licensed practice where it is
      required.
    </Typography.Paragraph>
  );
}
