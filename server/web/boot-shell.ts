/**
 * A first screen in plain HTML, painted before the app's JavaScript arrives: the name, what
 * Faintline is for, and a loading line. The app replaces it as soon as it renders.
 */
const SHELL = `<div class="fl-boot" aria-busy="true">
<style>
.fl-boot{box-sizing:border-box;min-height:100%;width:100%;padding:48px 24px;background:#F3F0E8;color:#10201F;font-family:system-ui,-apple-system,"Segoe UI",Roboto,sans-serif}
.fl-boot div{max-width:440px;margin:0 auto}
.fl-boot h1{font-size:30px;margin:0 0 12px;letter-spacing:.2px}
.fl-boot h1 span{color:#C9761F}
.fl-boot p{font-size:17px;line-height:1.5;margin:0 0 16px;color:#33524F}
.fl-boot small{font-size:14px;color:#0F6760}
@media (prefers-color-scheme:dark){.fl-boot{background:#0A1416;color:#E4EEEC}.fl-boot p{color:#A8BDB9}.fl-boot small{color:#5CC2B4}}
</style>
<div><h1>Faintline<span>.</span></h1>
<p>Plan, tune and look after your low-power WSPR beacons: register the hardware, calibrate every band into the receive window, rotate bands on a UTC timeline, provision the devices and keep a club's beacons out of each other's way.</p>
<small>Loading Faintline…</small></div></div>`;

export function withBootShell(indexHtml: string): string {
  return indexHtml.replace('<div id="root"></div>', `<div id="root">${SHELL}</div>`);
}
