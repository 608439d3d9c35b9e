import { Alert } from 'antd';

/** The caution shown on every sheet: measuring a truck means getting under it. */
export function MeasurementSafety() {
  return (
    <Alert
      type="warning"
      showIcon
      data-testid="measurement-safety"
      title="Before you get under the truck"
      description="Support the vehicle on rated jack stands on solid, level ground and chock the wheels; never work under a vehicle held only by a jack. Take ride-height readings with the truck back on its wheels. These readings are a planning aid: follow licensed practice and local rules for lifting, welding and any change to steering or brakes."
    />
  );
}
