import type { TextKey } from './en.ts';

/**
 * The French bundle, partial on purpose: the frame of every page, the caution, numbers,
 * directions, bands and the safety advice are translated; the rest falls back to English
 * (web/text/translator.ts), which shows how a partly translated language behaves.
 */
export const FR: Readonly<Partial<Record<TextKey, string>>> = {
  'site.tagline': 'Dépistage des secousses sismiques pour les petites communautés',
  'site.skip': 'Aller au contenu principal',
  'nav.main': 'Principal',
  'nav.studies': 'Études',
  'nav.limits': 'Limites d’un dépistage',
  'nav.study': 'Cette étude',
  'nav.overview': 'Vue d’ensemble',
  'nav.scenario': 'Scénario',
  'nav.catalog': 'Catalogue de séismes',
  'nav.edit': 'Modifier l’étude',
  'lang.label': 'Langue',
  'lang.change': 'Changer',
  'footer.version': 'Tremora {version}.',
  'footer.demo': 'Toutes les données de cette étude de démonstration sont inventées.',
  'numbers.small': 'zéro|un|deux|trois|quatre|cinq|six|sept|huit|neuf|dix',

  'caution.title': 'Un dépistage, pas une valeur de calcul',
  'caution.text':
    'Ces chiffres sont une estimation de dépistage, pas une valeur de calcul. Ne les utilisez pas pour concevoir, réparer, autoriser ou assurer un bâtiment. Les codes de construction et les ingénieurs agréés décident.',
  'caution.short':
    'Estimation de dépistage, pas une valeur de calcul. Les codes de construction et les ingénieurs agréés décident.',
  'caution.limitsLink': 'Lire les limites d’un dépistage',

  'chance.oneIn': 'environ 1 sur {n}',
  'chance.inTen': 'environ {k} sur 10',
  'chance.lessThan': 'moins de 1 sur {n}',
  'chance.moreThanNine': 'plus de 9 sur 10',
  'chance.percent': '{p} %',
  'chance.percentBelow': 'moins de {p} %',
  'chance.overYears': '{frequency} au cours des {years} prochaines années ({percent})',

  'place.here': 'sous cet endroit ou tout près',
  'place.away': 'à {km} km au {direction}',
  'compass.N': 'nord',
  'compass.NE': 'nord-est',
  'compass.E': 'est',
  'compass.SE': 'sud-est',
  'compass.S': 'sud',
  'compass.SW': 'sud-ouest',
  'compass.W': 'ouest',
  'compass.NW': 'nord-ouest',

  'band.label': 'Niveau de dépistage',
  'editor.sourceChecks': 'Vérification des sources (avertissements : rien n’est refusé)',
  'firmness.title': 'Ce niveau est-il sûr',
  'firmness.overview': 'Ce que chaque niveau a de sûr',
  'firmness.shares': 'Parmi les choix derrière ces chiffres, {shares}.',
  'firmness.share': '{percent} du poids donne {band}',
  'firmness.hinge': 'Le niveau dépend surtout de {subject} : {alternatives}.',
  'firmness.steady':
    'Aucun choix seul ne change le niveau. {subject} le fait le plus varier : {alternatives}.',
  'firmness.alternative': 'avec {value}, {band}',
  'firmness.subject.source': '{choice} de {source}',
  'firmness.subject.setting': '{choice} ({setting})',
  'firmness.choice.groundMotion': 'le modèle de mouvement du sol',
  'firmness.choice.mMax': 'la magnitude maximale',
  'firmness.choice.bValue': 'la valeur b',
  'firmness.choice.shape': 'la forme magnitude–fréquence',
  'firmness.choice.slipRateMmYr': 'la vitesse de glissement',
  'firmness.choice.rate': 'le taux de séismes',
  'firmness.setting.crustal': 'croûte',
  'firmness.setting.interface': 'interface des plaques',
  'firmness.setting.intraslab': 'plaque plongeante',
  'band.refer-first': 'À signaler d’abord',
  'band.refer-soon': 'À signaler bientôt',
  'band.prepare': 'Préparer et informer',
  'band.inform': 'Informer',

  'home.title': 'Études',

  'safety.before.title': 'Avant les secousses',
  'safety.during.title': 'Pendant les secousses',
  'safety.during':
    'Mettez-vous à genoux. Protégez votre tête et votre nuque sous une table solide ou contre un mur intérieur. Tenez bon jusqu’à la fin des secousses.\nRestez où vous êtes. Ne sortez pas en courant pendant que le sol tremble.\nAu lit, restez-y et protégez votre tête avec un oreiller.\nDehors, éloignez-vous des bâtiments, des arbres, des lignes électriques et des pentes.\nEn voiture, arrêtez-vous dans un endroit dégagé et restez à l’intérieur.',
  'safety.after.title': 'Après les secousses',
  'tsunami.title': 'Sur la côte : montez sur les hauteurs',

  'limits.title': 'Les limites d’un dépistage',

  'error.notFound': 'Page introuvable',
  'error.home': 'Aller à la liste des études',
  'map.contourDepth': 'à {depth} km de profondeur',
};
