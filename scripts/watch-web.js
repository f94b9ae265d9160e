// Rebuilds the web export when client sources change (used by npm run dev); one build at a time.
const { spawn } = require('node:child_process');
const fs = require('node:fs');
const path = require('node:path');

const root = path.resolve(__dirname, '..');
const dirs = ['app', 'components', 'lib', 'shared', 'assets'];
let timer = null;
let building = false;
let again = false;

function build() {
  if (building) {
    again = true;
    return;
  }
  building = true;
  const child = spawn('bash', ['scripts/build-web.sh'], { cwd: root, stdio: 'inherit' });
  child.on('exit', () => {
    building = false;
    if (again) {
      again = false;
      build();
    }
  });
}

for (const dir of dirs) {
  const full = path.join(root, dir);
  if (!fs.existsSync(full)) continue;
  fs.watch(full, { recursive: true }, () => {
    clearTimeout(timer);
    timer = setTimeout(build, 300);
  });
}
console.log('Watching client sources; the web app rebuilds on change (reload the page).');
