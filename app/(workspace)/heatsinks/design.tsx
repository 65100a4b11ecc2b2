import { SinkDesignScreen } from '@/features/heatsinks/sink-design-screen';

export default SinkDesignScreen;
