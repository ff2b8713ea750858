export { CalendarPanel } from './components/calendar-panel';
