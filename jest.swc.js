// One SWC transform for every jest project: Nest's dependency injection needs decorator metadata.
module.exports = {
  '^.+\\.(t|j)s$': [
    '@swc/jest',
    {
      jsc: {
        parser: { syntax: 'typescript', decorators: true },
        transform: { legacyDecorator: true, decoratorMetadata: true },
        target: 'es2022',
        keepClassNames: true,
      },
      module: { type: 'commonjs' },
    },
  ],
};
