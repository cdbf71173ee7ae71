import { definePreset } from '@primeuix/themes'
import Aura from '@primeuix/themes/aura'

/**
 * Quellnode's own palette: a deep petrol for action and an amber accent for warnings, chosen for
 * contrast on a tablet outdoors. Built over Aura so every component is styled.
 */
export const QuellPreset = definePreset(Aura, {
  semantic: {
    primary: {
      50: '#eef7f8',
      100: '#d3eaee',
      200: '#a7d4dc',
      300: '#6fb6c3',
      400: '#3a93a5',
      500: '#1c7489',
      600: '#135e71',
      700: '#0f4c5c',
      800: '#0d3d4a',
      900: '#0a2f39',
      950: '#061d24',
    },
    colorScheme: {
      light: {
        surface: {
          0: '#ffffff',
          50: '#f6f7f5',
          100: '#eceeea',
          200: '#d9ddd6',
          300: '#bcc2b8',
          400: '#949c90',
          500: '#6f776b',
          600: '#545b51',
          700: '#3e443c',
          800: '#2a2f29',
          900: '#1b1f1a',
          950: '#0e110d',
        },
      },
    },
  },
})
