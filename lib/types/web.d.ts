// React Native Web passes `dataSet` through as data-* attributes (used by the print stylesheet); React Native's own
// types do not know it. CSS files are imported for their side effect on the web bundle only.
import 'react-native';

declare module 'react-native' {
  interface ViewProps {
    dataSet?: Record<string, string>;
  }
  interface ScrollViewProps {
    dataSet?: Record<string, string>;
  }
}
