import { mountDesignBar } from '/js/common/design-bar.js';

const value = (id) => Number(document.getElementById(id).value);
mountDesignBar(document.getElementById('design-bar'), {
  kind: 'string',
  getParameters: () => ({ lengthMm: value('lengthMm'), tensionN: value('tensionN'), material: 'plain-steel',
    diameterMm: value('diameterMm'), endCondition: 'pinned', stiffness: true, modeCount: 12 }),
  setParameters: (p) => {
    for (const id of ['lengthMm', 'tensionN', 'diameterMm']) document.getElementById(id).value = p[id];
  },
});
