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
  'band.refer-first': 'À signaler d’abord',
  'band.refer-soon': 'À signaler bientôt',
  'band.prepare': 'Préparer et informer',
  'band.inform': 'Informer',

  'home.title': 'Études',

  'overview.col.rank': 'Rang',
  'overview.col.community': 'Communauté',
  'overview.col.band': 'Niveau de dépistage',

  'priority.heading': 'Où aller d’abord : priorité des visites',
  'priority.intro':
    'Le niveau de dépistage dit la force possible des secousses. La priorité des visites aide à choisir où aller d’abord : elle compte aussi les habitants, les écoles et les dispensaires, et l’éloignement d’une piste d’atterrissage ou d’une localité plus grande.',
  'priority.rule':
    'Chaque élément est ramené à sa part de la plus grande valeur de l’étude. Le score est la moyenne pondérée de ces parts, de 0 à 100. Une valeur inconnue compte pour zéro.',
  'priority.weights': 'Poids (de 0 à 10 ; seuls leurs rapports comptent)',
  'priority.default': 'par défaut {weight}',
  'priority.apply': 'Appliquer les poids',
  'priority.unusedNote':
    'Absent de la liste des villages, donc exclu de tous les scores : {names}.',
  'priority.tableCaption': 'Communautés par priorité de visite',
  'priority.col.choose': 'Tournée',
  'priority.col.score': 'Score',
  'priority.col.visits': 'Visites enregistrées',
  'priority.chooseOne': 'Ajouter {name} à la tournée',
  'priority.component.people': 'Habitants',
  'priority.component.chance': 'Probabilité d’une intensité MMI VII ou plus en {years} ans',
  'priority.component.facilities': 'Écoles et dispensaires',
  'priority.component.isolation':
    'Distance à une piste d’atterrissage ou à une localité plus grande',
  'priority.unknown': 'inconnu',
  'priority.km': '{km} km',
  'priority.share': '{share} % de la plus grande valeur, {points} points',

  'trip.options': 'Plan de tournée',
  'trip.startFrom': 'Partir de',
  'trip.startFirst': 'le premier village choisi',
  'trip.returnToStart': 'Revenir au point de départ',
  'trip.plan': 'Planifier une tournée avec les villages choisis',
  'trip.title': '{name} : plan de tournée',
  'trip.method':
    'Ordre des visites : depuis le départ, toujours le village le plus proche pas encore visité ; puis tout tronçon du trajet est inversé si cela le raccourcit (2-opt). C’est une règle pratique courante. Pour quelques villages, elle trouve en général l’ordre le plus court, mais pas toujours.',
  'trip.caption': 'Étapes dans l’ordre des visites',
  'trip.col.stop': 'Étape',
  'trip.col.leg': 'Depuis l’étape précédente',
  'trip.col.sofar': 'Distance cumulée',
  'trip.start': 'départ',
  'trip.backTo': 'Retour à {name}',
  'trip.total': 'Distance totale',
  'trip.straightLine':
    'Les distances sont à vol d’oiseau sur la surface de la Terre, pas par la route, la piste ou le bateau. Le trajet réel est plus long.',
  'trip.back': 'Retour à la priorité des visites',
  'trip.noneChosen': 'Choisissez au moins un village pour la tournée.',
  'trip.unknown': 'Cette étude n’a pas de communauté d’identifiant « {id} ».',

  'visits.heading': 'Visites',
  'visits.none': 'Aucune visite n’a encore été enregistrée ici.',
  'visits.caption': 'Visites enregistrées, les plus récentes d’abord',
  'visits.record': 'Enregistrer une visite',
  'visits.formTitle': 'Enregistrer une visite à {name}',
  'visits.problems': 'La visite n’a pas été enregistrée. Corrigez les champs signalés ci-dessous.',
  'visits.save': 'Enregistrer la visite',
  'visits.backToCommunity': 'Retour à {name}',
  'visits.field.visitedOn': 'Date de la visite',
  'visits.field.language': 'Langue utilisée',
  'visits.field.peopleReached': 'Personnes touchées',
  'visits.field.topics': 'Sujets abordés',
  'visits.field.followUps': 'Suites à donner',
  'visits.field.referral': 'Demande d’évaluation par un professionnel',
  'visits.referral.none': 'aucune',
  'visits.referral.requested': 'demandée',
  'visits.referral.assessed': 'évaluée',
  'visits.referral.closed': 'close',
  'visits.download': 'Toutes les visites en CSV',

  'safety.before.title': 'Avant les secousses',
  'safety.during.title': 'Pendant les secousses',
  'safety.during':
    'Mettez-vous à genoux. Protégez votre tête et votre nuque sous une table solide ou contre un mur intérieur. Tenez bon jusqu’à la fin des secousses.\nRestez où vous êtes. Ne sortez pas en courant pendant que le sol tremble.\nAu lit, restez-y et protégez votre tête avec un oreiller.\nDehors, éloignez-vous des bâtiments, des arbres, des lignes électriques et des pentes.\nEn voiture, arrêtez-vous dans un endroit dégagé et restez à l’intérieur.',
  'safety.after.title': 'Après les secousses',
  'tsunami.title': 'Sur la côte : montez sur les hauteurs',

  'limits.title': 'Les limites d’un dépistage',

  'error.notFound': 'Page introuvable',
  'error.home': 'Aller à la liste des études',
};
