import nextCoreWebVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  {
    ignores: ['node_modules/**', '.next/**', '.runtime/**', 'next-env.d.ts', 'test-results/**', 'playwright-report/**'],
  },
  {
    // Prettier (npm run format, checked by npm test) wraps code at 120 characters; this holds comments to the
    // same width. Sentences in strings and template literals are left whole, as the words users read.
    rules: {
      'max-len': [
        'error',
        { code: 120, ignoreStrings: true, ignoreTemplateLiterals: true, ignoreUrls: true, ignoreRegExpLiterals: true },
      ],
    },
  },
  {
    files: ['**/*.cjs'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    // The engineering core is used only through its barrel, hydraulics/index.ts (its export list is
    // pinned by tests/hydraulics/index.test.ts). The core's own files and its unit tests reach inside.
    files: ['**/*.{ts,tsx,mts,cts,js,mjs,cjs}'],
    ignores: ['hydraulics/**', 'tests/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(@/|(\\.\\.?/)+)hydraulics/(?!index$)',
              message:
                "Import the engineering core through its barrel: '@/hydraulics/index' (or a relative path to hydraulics/index).",
            },
          ],
        },
      ],
    },
  },
  {
    files: ['tests/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
];

export default config;
