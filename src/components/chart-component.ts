/**
 * The chart component for every chart of the app: the apexcharts core entry with only the line
 * type and the two features our charts use (legend, annotations for limits and choices), so the
 * full library and its server-rendering build stay out of the client bundle.
 */
import VueApexCharts from 'vue3-apexcharts/core'
import 'apexcharts/line'
import 'apexcharts/features/legend'
import 'apexcharts/features/annotations'

export default VueApexCharts
