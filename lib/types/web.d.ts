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
  // React Native Web renders a Text with `href` as an anchor; `hrefAttrs` sets its download, rel and target.
  interface TextProps {
    href?: string;
    hrefAttrs?: { download?: string | boolean; rel?: string; target?: string };
  }
}
