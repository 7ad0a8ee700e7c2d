/**
 * Every chart of the app in one module, loaded on first use. Because all lazy chart imports go
 * through here, the charting library lands in this one chunk instead of the start-up bundle.
 */
export { default as TimelineChart } from '../schedules/timeline-chart';
export { default as OccupancyChart } from '../clubs/occupancy-chart';
export { default as HealthCharts } from '../health/health-charts';
export { default as ReceptionCharts } from '../receptions/reception-charts';
export { HourBandChart } from '../receptions/reception-charts';
