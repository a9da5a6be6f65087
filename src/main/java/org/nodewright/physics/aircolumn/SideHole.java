package org.nodewright.physics.aircolumn;

/**
 * A side hole in the element chain: the T network of {@link ToneHoleModel} (series Za/2, shunt
 * 1/Zs, series Za/2; Lefebvre &amp; Scavone 2012) applied upstream, in the hole's local air.
 */
record SideHole(double start, ToneHoleModel model, LocalAir localAir) implements ChainElement {

    @Override
    public double rotationLength() {
        return 2 * model.chimneyLength() * localAir.kappa();
    }

    @Override
    public void propagate(DuctKernel.Frequency w, double er, double ei, DuctKernel.State s) {
        double[] hz = w.holeScratch;
        LocalAir la = localAir;
        model.impedances(w.k * la.kappa(), w.sw * la.sigma(), er, ei, w.losses, la.keefe(), la.air(), hz);
        double zeta = la.zeta();
        double har = hz[2] / 2 * zeta;
        double hai = hz[3] / 2 * zeta;
        double pr = s.pr + har * s.ur - hai * s.ui;
        double pi = s.pi + har * s.ui + hai * s.ur;
        double d = (hz[0] * hz[0] + hz[1] * hz[1]) * zeta;
        double yr = hz[0] / d;
        double yi = -hz[1] / d;
        double ur = s.ur + yr * pr - yi * pi;
        double ui = s.ui + yr * pi + yi * pr;
        s.pr = pr + har * ur - hai * ui;
        s.pi = pi + har * ui + hai * ur;
        s.ur = ur;
        s.ui = ui;
    }
}
