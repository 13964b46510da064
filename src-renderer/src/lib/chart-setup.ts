import {
  Chart,
  LineController,
  LineElement,
  PointElement,
  LinearScale,
  LogarithmicScale,
  Legend,
  Tooltip,
  Title,
} from 'chart.js';

// only what the workspace draws: line charts on linear or log axes with a legend and tooltips
Chart.register(LineController, LineElement, PointElement, LinearScale, LogarithmicScale, Legend, Tooltip, Title);
Chart.defaults.font.family = 'system-ui, "DejaVu Sans", "Liberation Sans", sans-serif';
Chart.defaults.color = '#1d2630';
Chart.defaults.animation = false;

export { Chart };
