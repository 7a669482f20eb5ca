// CSS files are imported for their side effect on the web bundle only.
declare module '*.css';
