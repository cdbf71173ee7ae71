import { describe, expect, it } from 'vitest'
import type { Page } from 'puppeteer-core'
import {
  browserRigPerFile,
  choose,
  enter,
  openStep,
  shot,
  valueOf,
  waitForText,
} from '../helpers/browser'
import { engineerOnSizing, reopen } from '../helpers/sizing-on-span'

const rig = browserRigPerFile()

/** Saves from the hand-over step and waits for the server's revision. */
async function save(page: Page, revision: number) {
  await openStep(page, 'Hand over')
  await page.locator('::-p-aria([name="Save sizing"][role="button"])').click()
  await waitForText(page, `Saved as revision ${revision}, computed on the server`)
}

describe('the design load in the sizing form, in Chromium', () => {
  it('saves a rotating machine and then a support acceleration with a stroke limit as typed, and reopens them', async () => {
    const { sizing, page, agent, base } = await engineerOnSizing(rig)
    const stored = async () => (await agent.get(`/api/sizings/${sizing.id}`)).body

    // A fan on the span: unbalance with a decimal comma, running speed in rpm.
    await page.goto(`${base}/target`)
    await page.waitForSelector('#load-kind')
    await choose(page, 'load-kind', 'Rotating machine')
    await enter(page, '#unbalance', '0,02')
    await waitForText(page, '= 0.02 kg·m')
    await enter(page, '#running-speed', '1480 rpm')
    // 1480 rpm = 1480 × 2π/60 = 154.985 rad/s (definition of the revolution)
    await waitForText(page, '= 1480 rpm (154.985 rad/s)')
    // F = m·e·ω² = 0.02 × 154.985² = 480.4 N (any machine-dynamics text, e.g. Thomson)
    await waitForText(page, 'F = m·e·ω² = 480.4 N')
    await waitForText(page, "the machine's running speed")
    await shot(page, 'load-rotating-machine')
    await save(page, 2)

    const machine = await stored()
    expect(machine.input.unbalance).toBe(0.02)
    expect(machine.input.speed.hz * 60).toBeCloseTo(1480, 9)
    expect(machine.input.loadKind).toBeUndefined()
    expect(machine.input.band).toBeUndefined()
    expect(machine.evaluation.result.excitation).toMatchObject({ unbalance: true, unit: 'kg·m' })
    expect(machine.summary.load).toBe(
      'Rotating machine at node-2: running speed 1480 rpm (24.7 Hz), unbalance 0.02 kg·m',
    )

    await reopen(page, `${base}/target`, '#unbalance')
    expect(await valueOf(page, '#unbalance')).toBe('0.02 kg·m')
    expect(await valueOf(page, '#running-speed')).toBe('1480 rpm')
    await openStep(page, 'Results')
    await waitForText(page, 'running speed 1480 rpm (24.7 Hz), unbalance 0.02 kg·m')

    // The same span under floor vibration from a neighbouring plant, with a stroke limit.
    await openStep(page, 'Target')
    await choose(page, 'load-kind', 'Support (base) acceleration')
    await enter(page, '#base-acceleration', '0,4')
    await waitForText(page, '= 0.4 m/s²')
    await openStep(page, 'Absorber')
    await enter(page, '#stroke-limit', '25 mm')
    await waitForText(page, '= 0.025 m')
    await waitForText(page, 'limit 25.0 mm')
    await choose(page, 'relative-to-node', 'The relative motion against node-1')
    await waitForText(page, 'Between node-2 and node-1')
    // a closed form says which of these choices lie outside its stated scope (Den Hartog 1956:
    // a force on an undamped single-mode host at the absorber)
    await choose(page, 'tuning', 'Den Hartog')
    await waitForText(page, "Outside this closed form's stated scope")
    await waitForText(page, 'base excitation')
    await waitForText(page, 'an absorber acting between two nodes')
    await choose(page, 'tuning', 'Optimised on the model: least peak')
    await shot(page, 'load-base-stroke-limit')
    await save(page, 3)

    const support = await stored()
    expect(support.input).toMatchObject({
      loadKind: 'base',
      baseAcceleration: 0.4,
      strokeLimit: 0.025,
      relativeToNode: 'node-1',
    })
    expect(support.input.unbalance).toBeUndefined()
    expect(support.input.speed).toBeUndefined()
    expect(support.evaluation.result.excitation).toMatchObject({ kind: 'base', unit: 'm/s²' })
    expect(support.evaluation.result.absorber.relativeTo).toBe('node-1')
    expect(support.summary).toMatchObject({
      load: 'Support (base) acceleration 0.4 m/s²',
      strokeLimit: 0.025,
    })

    await reopen(page, `${base}/absorber`, '#stroke-limit')
    expect(await valueOf(page, '#stroke-limit')).toBe('0.025 m')
    await waitForText(page, 'The relative motion against node-1')
    await openStep(page, 'Target')
    await page.waitForSelector('#base-acceleration')
    expect(await valueOf(page, '#base-acceleration')).toBe('0.4 m/s²')
    await openStep(page, 'Results')
    await waitForText(page, 'Support (base) acceleration 0.4 m/s²')
    await waitForText(page, 'limit 25.0 mm')
    await page.browserContext().close()
  }, 120_000)
})
