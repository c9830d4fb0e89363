// The accessibility test reads the web app's route tables, whose views load lazily; it never loads a view.
declare module '*.vue' {
  const view: unknown;
  export default view;
}
